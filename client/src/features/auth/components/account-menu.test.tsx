import { describe, expect, it } from '@jest/globals';
import { screen, waitFor } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { testUser } from '../../../../test/fixtures.js';
import { COLOR_MODE_STORAGE_KEY } from '../../../app/theme/endgrain-theme-provider.js';
import { AUTH_TOKEN_KEY } from '../../../lib/auth-token.js';
import { authDocuments } from '../api/auth-documents.js';
import { AccountMenu } from './account-menu.js';

const signedIn = {
  token: 'token-1',
  mocks: [{ request: { query: authDocuments.me }, result: { data: { me: testUser() } } }],
};

describe('AccountMenu', () => {
  it('offers sign-in and account creation to a visitor', async () => {
    const { user } = renderWithProviders({ element: <AccountMenu /> });
    await user.click(screen.getByRole('button', { name: 'Account menu' }));
    expect(screen.getByRole('menuitem', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
    expect(screen.getByRole('menuitem', { name: 'Create account' })).toHaveAttribute('href', '/sign-up');
    expect(screen.queryByRole('menuitem', { name: 'Sign out' })).not.toBeInTheDocument();
  });

  it('signs a member out and forgets the token', async () => {
    const { user, router } = renderWithProviders({ element: <AccountMenu />, path: '/account', ...signedIn });
    await user.click(await screen.findByRole('button', { name: 'Account menu for Rowan Tamarack' }));
    expect(screen.getByRole('menuitem', { name: 'Account' })).toHaveAttribute('href', '/account');

    await user.click(screen.getByRole('menuitem', { name: 'Sign out' }));

    expect(window.localStorage.getItem(AUTH_TOKEN_KEY)).toBeNull();
    expect(router.state.location.pathname).toBe('/');
    expect(await screen.findByRole('button', { name: 'Account menu' })).toBeInTheDocument();
  });

  it('remembers a chosen dark theme', async () => {
    const { user } = renderWithProviders({ element: <AccountMenu /> });
    await user.click(screen.getByRole('button', { name: 'Account menu' }));
    expect(screen.getByRole('menuitemradio', { name: 'Match this device' })).toHaveAttribute('aria-checked', 'true');

    await user.click(screen.getByRole('menuitemradio', { name: 'Dark' }));

    await waitFor(() => expect(window.localStorage.getItem(COLOR_MODE_STORAGE_KEY)).toBe('dark'));
    expect(screen.getByRole('menuitemradio', { name: 'Dark' })).toHaveAttribute('aria-checked', 'true');
  });
});
