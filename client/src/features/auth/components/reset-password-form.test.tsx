import { describe, expect, it, jest } from '@jest/globals';
import { screen, waitFor } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { authDocuments } from '../api/auth-documents.js';
import { ResetPasswordForm } from './reset-password-form.js';

describe('ResetPasswordForm', () => {
  it('offers a fresh link when the server rejects the token', async () => {
    const onDone = jest.fn();
    const { user } = renderWithProviders({
      element: <ResetPasswordForm token="stale" onDone={onDone} />,
      mocks: [
        {
          request: { query: authDocuments.resetPassword, variables: { token: 'stale', password: 'a long new phrase' } },
          result: { data: null, errors: [{ message: 'This link has expired.', extensions: { code: 'TOKEN_INVALID' } }] },
        },
      ],
    });

    await user.type(screen.getByLabelText('New password'), 'a long new phrase');
    await user.click(screen.getByRole('button', { name: 'Set new password' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('This link has expired.');
    expect(screen.getByRole('link', { name: 'Ask for a new reset link' })).toHaveAttribute('href', '/forgot-password');
    expect(onDone).not.toHaveBeenCalled();
  });

  it('reports success once the password is set', async () => {
    const onDone = jest.fn();
    const { user } = renderWithProviders({
      element: <ResetPasswordForm token="fresh" onDone={onDone} />,
      mocks: [
        {
          request: { query: authDocuments.resetPassword, variables: { token: 'fresh', password: 'a long new phrase' } },
          result: { data: { resetPassword: true } },
        },
      ],
    });
    await user.type(screen.getByLabelText('New password'), 'a long new phrase');
    await user.click(screen.getByRole('button', { name: 'Set new password' }));
    await waitFor(() => expect(onDone).toHaveBeenCalledTimes(1));
  });
});

