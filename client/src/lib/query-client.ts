import { QueryClient } from '@tanstack/react-query';

// For REST and search calls only; GraphQL data belongs to Apollo's cache.
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: 1,
        // Phones at a meet switch apps constantly; refetching on every return wastes a weak signal.
        refetchOnWindowFocus: false,
      },
    },
  });
}
