import { describe, expect, it, jest } from '@jest/globals';
import { screen } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { authDocuments } from '../api/auth-documents.js';
import { SignUpForm } from './sign-up-form.js';

describe('SignUpForm', () => {
  it('shows field errors for a short password and a bad e-mail without calling the server', async () => {
    const onSignedUp = jest.fn();
    // No mocks: any request would fail the test with "No more mocked responses".
    const { user } = renderWithProviders({ element: <SignUpForm onSignedUp={onSignedUp} /> });

    await user.type(screen.getByLabelText('Display name'), 'Rowan Tamarack');
    await user.type(screen.getByLabelText('Email'), 'rowan-at-example.org');
    await user.type(screen.getByLabelText('Password'), 'short1'); // 6 characters, rule says 10
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    // shared password policy wording; 10 is its MIN_PASSWORD_LENGTH
    expect(await screen.findByText('Password must be at least 10 characters.')).toBeInTheDocument();
    expect(screen.getByText(/does not look like an e-mail address/)).toBeInTheDocument();
    expect(screen.getByLabelText('Email')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByLabelText('Password')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByLabelText('Display name')).toHaveAttribute('aria-invalid', 'false');
    expect(onSignedUp).not.toHaveBeenCalled();
  });

  it('refuses a password from the common-passwords list before sending it', async () => {
    const { user } = renderWithProviders({ element: <SignUpForm onSignedUp={jest.fn()} /> });
    // "password123" is 11 characters, long enough, but on the shared list of common passwords
    await user.type(screen.getByLabelText('Password'), 'password123');
    await user.click(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText(/commonly used passwords/)).toBeInTheDocument();
  });

  it('puts an EMAIL_TAKEN answer next to the e-mail field', async () => {
    const input = { displayName: 'Rowan Tamarack', email: 'rowan@example.org', password: 'long enough phrase' };
    const { user } = renderWithProviders({
      element: <SignUpForm onSignedUp={jest.fn()} />,
      mocks: [
        {
          request: { query: authDocuments.signUp, variables: { input } },
          result: {
            data: null,
            errors: [{ message: 'An account already uses this address.', extensions: { code: 'EMAIL_TAKEN' } }],
          },
        },
      ],
    });

    await user.type(screen.getByLabelText('Display name'), input.displayName);
    await user.type(screen.getByLabelText('Email'), input.email);
    await user.type(screen.getByLabelText('Password'), input.password);
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('An account already uses this address.')).toBeInTheDocument();
    expect(screen.getByLabelText('Email')).toHaveAccessibleDescription('An account already uses this address.');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});
