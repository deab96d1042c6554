import { describe, expect, it } from '@jest/globals';
import { screen } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { testUser } from '../../../../test/fixtures.js';
import { authDocuments } from '../api/auth-documents.js';
import type { User } from '../api/types.js';
import { RequireAuth } from './require-auth.js';

function renderGuarded(options: { path: string; roles?: ReadonlyArray<User['role']>; me?: User }) {
  return renderWithProviders({
    path: options.path,
    ...(options.me
      ? {
          token: 'token-1',
          mocks: [{ request: { query: authDocuments.me }, result: { data: { me: options.me } } }],
        }
      : {}),
    routes: [
      { path: '/sign-in', element: <h1>Sign in page</h1> },
      {
        path: '/rack',
        element: (
          <RequireAuth {...(options.roles ? { roles: options.roles } : {})}>
            <h1>Club rack</h1>
          </RequireAuth>
        ),
      },
    ],
  });
}

describe('RequireAuth', () => {
  it('sends a signed-out visitor to sign-in with the way back', async () => {
    const { router } = renderGuarded({ path: '/rack?status=ready' });
    expect(await screen.findByRole('heading', { name: 'Sign in page' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    // hand-worked: URLSearchParams encodes "/rack?status=ready" as %2Frack%3Fstatus%3Dready
    expect(router.state.location.search).toBe('?returnTo=%2Frack%3Fstatus%3Dready');
  });

  it('lets a signed-in member in', async () => {
    renderGuarded({ path: '/rack', me: testUser() });
    expect(await screen.findByRole('heading', { name: 'Club rack' })).toBeInTheDocument();
  });

  it('keeps out a role the page is not for', async () => {
    renderGuarded({ path: '/rack', roles: ['COACH'], me: testUser({ role: 'ATHLETE' }) });
    expect(await screen.findByRole('alert')).toHaveTextContent('This page is for coach accounts.');
    expect(screen.queryByRole('heading', { name: 'Club rack' })).not.toBeInTheDocument();
  });

  it('lets an admin into a page for other roles', async () => {
    // DESIGN: the league administrator may do everything.
    renderGuarded({ path: '/rack', roles: ['COACH'], me: testUser({ role: 'ADMIN' }) });
    expect(await screen.findByRole('heading', { name: 'Club rack' })).toBeInTheDocument();
  });
});
