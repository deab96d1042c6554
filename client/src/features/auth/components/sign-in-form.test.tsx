import { describe, expect, it, jest } from '@jest/globals';
import { screen, waitFor } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { testUser } from '../../../../test/fixtures.js';
import { AUTH_TOKEN_KEY } from '../../../lib/auth-token.js';
import { authDocuments } from '../api/auth-documents.js';
import { SignInForm } from './sign-in-form.js';

const input = { email: 'rowan.tamarack@example.org', password: 'correct horse staple' };

async function fillAndSubmit(user: ReturnType<typeof renderWithProviders>['user']) {
  await user.type(screen.getByLabelText('Email'), input.email);
  await user.type(screen.getByLabelText('Password'), input.password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInForm', () => {
  it('shows an INVALID_CREDENTIALS answer in an alert', async () => {
    const onSignedIn = jest.fn();
    const { user } = renderWithProviders({
      element: <SignInForm onSignedIn={onSignedIn} />,
      mocks: [
        {
          request: { query: authDocuments.signIn, variables: { input } },
          result: {
            data: null,
            errors: [{ message: 'That e-mail and password do not match.', extensions: { code: 'INVALID_CREDENTIALS' } }],
          },
        },
      ],
    });

    await fillAndSubmit(user);

    expect(await screen.findByRole('alert')).toHaveTextContent('That e-mail and password do not match.');
    expect(onSignedIn).not.toHaveBeenCalled();
    expect(window.localStorage.getItem(AUTH_TOKEN_KEY)).toBeNull();
  });

  it('disables the button while signing in, then stores the token', async () => {
    const onSignedIn = jest.fn();
    const { user } = renderWithProviders({
      element: <SignInForm onSignedIn={onSignedIn} />,
      mocks: [
        {
          request: { query: authDocuments.signIn, variables: { input } },
          delay: 50,
          result: { data: { signIn: { __typename: 'AuthPayload', accessToken: 'token-xyz', user: testUser() } } },
        },
      ],
    });

    await fillAndSubmit(user);

    expect(screen.getByRole('button', { name: 'Sign in' })).toBeDisabled();
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(expect.objectContaining({ id: 'user-1' })));
    expect(window.localStorage.getItem(AUTH_TOKEN_KEY)).toBe('token-xyz');
  });

  it('asks for both fields before calling the server', async () => {
    const { user } = renderWithProviders({ element: <SignInForm onSignedIn={jest.fn()} /> });
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
  });
});
