import { describe, expect, it } from '@jest/globals';
import { screen } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { testUser } from '../../../../test/fixtures.js';
import { authDocuments } from '../api/auth-documents.js';
import { VerifyEmailStatus } from './verify-email-status.js';

describe('VerifyEmailStatus', () => {
  it('confirms the address and offers sign-in to a visitor', async () => {
    renderWithProviders({
      element: <VerifyEmailStatus token="tok-1" />,
      mocks: [
        {
          request: { query: authDocuments.verifyEmail, variables: { token: 'tok-1' } },
          result: { data: { verifyEmail: testUser({ emailVerified: true }) } },
        },
      ],
    });
    expect(await screen.findByRole('status')).toHaveTextContent('rowan.tamarack@example.org is confirmed');
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
  });

  it('explains a rejected link and says how to get a new one', async () => {
    renderWithProviders({
      element: <VerifyEmailStatus token="used" />,
      mocks: [
        {
          request: { query: authDocuments.verifyEmail, variables: { token: 'used' } },
          result: { data: null, errors: [{ message: 'This link has expired.', extensions: { code: 'TOKEN_INVALID' } }] },
        },
      ],
    });
    expect(await screen.findByRole('alert')).toHaveTextContent('This link has expired.');
    expect(screen.getByRole('link', { name: 'Sign in to get a new link' })).toHaveAttribute(
      'href',
      '/sign-in?returnTo=%2Faccount',
    );
  });
});
