import type { ApolloClient } from '@apollo/client';
import { ApolloProvider } from '@apollo/client/react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';

import { AuthProvider } from '../features/auth/components/auth-provider.js';
import { EndgrainThemeProvider } from './theme/endgrain-theme-provider.js';

export interface AppProvidersProps {
  apolloClient: ApolloClient;
  queryClient: QueryClient;
  children: ReactNode;
}

export function AppProviders({ apolloClient, queryClient, children }: AppProvidersProps) {
  return (
    <EndgrainThemeProvider>
      <ApolloProvider client={apolloClient}>
        <QueryClientProvider client={queryClient}>
          <AuthProvider>{children}</AuthProvider>
        </QueryClientProvider>
      </ApolloProvider>
    </EndgrainThemeProvider>
  );
}
