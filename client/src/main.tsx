import '@fontsource/nunito-sans/latin-400.css';
import '@fontsource/nunito-sans/latin-600.css';
import '@fontsource/nunito-sans/latin-700.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router/dom';

import { AppProviders } from './app/app-providers.js';
import { router } from './app/router.js';
import { createApolloClient } from './lib/apollo.js';
import { createQueryClient } from './lib/query-client.js';

const container = document.getElementById('root');
if (!container) throw new Error('index.html lacks the #root element');

createRoot(container).render(
  <StrictMode>
    <AppProviders apolloClient={createApolloClient()} queryClient={createQueryClient()}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);
