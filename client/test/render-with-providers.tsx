import type { MockLink } from '@apollo/client/testing';
import { MockedProvider } from '@apollo/client/testing/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router';

import { EndgrainThemeProvider } from '../src/app/theme/endgrain-theme-provider.js';
import { AuthProvider } from '../src/features/auth/components/auth-provider.js';
import { AUTH_TOKEN_KEY } from '../src/lib/auth-token.js';
import { createQueryClient } from '../src/lib/query-client.js';

export interface RenderOptions {
  /** A whole route tree; or `element`, which is mounted at every path. */
  routes?: RouteObject[];
  element?: ReactElement;
  path?: string;
  mocks?: ReadonlyArray<MockLink.MockedResponse>;
  /** Start signed in with this stored token (the `me` query then needs a mock). */
  token?: string;
}

/** Renders like the app does (theme, Apollo with mocks, a fresh query client, auth, a memory router). */
export function renderWithProviders({ routes, element, path = '/', mocks = [], token }: RenderOptions) {
  if (token) window.localStorage.setItem(AUTH_TOKEN_KEY, token);
  const router = createMemoryRouter(routes ?? [{ path: '*', element }], { initialEntries: [path] });
  const user = userEvent.setup();
  const result = render(
    <EndgrainThemeProvider>
      <MockedProvider mocks={mocks}>
        {/* Fresh per render so one test's REST cache never answers another's. */}
        <QueryClientProvider client={createQueryClient()}>
          <AuthProvider>
            <RouterProvider router={router} />
          </AuthProvider>
        </QueryClientProvider>
      </MockedProvider>
    </EndgrainThemeProvider>,
  );
  return { ...result, router, user };
}
