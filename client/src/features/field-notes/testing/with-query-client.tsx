import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { ReactElement } from 'react';

/** The app's TanStack provider for component tests (the shared test renderer brings Apollo only). */
export function withQueryClient(element: ReactElement): ReactElement {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return <QueryClientProvider client={client}>{element}</QueryClientProvider>;
}
