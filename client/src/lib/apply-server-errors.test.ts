import { CombinedGraphQLErrors } from '@apollo/client/errors';
import { describe, expect, it, jest } from '@jest/globals';
import type { UseFormSetError } from 'react-hook-form';

import { applyServerErrors } from './apply-server-errors.js';

type Form = { email: string; password: string };

function graphQLError(errors: Array<{ message: string; extensions: Record<string, unknown> }>) {
  return new CombinedGraphQLErrors({ data: null, errors });
}

describe('applyServerErrors', () => {
  it('puts a BAD_USER_INPUT error on the field the server names', () => {
    const setError = jest.fn<UseFormSetError<Form>>();
    const alert = applyServerErrors<Form>(
      graphQLError([{ message: 'Too common.', extensions: { code: 'BAD_USER_INPUT', field: 'password' } }]),
      { setError, fields: ['email', 'password'] },
    );
    expect(setError).toHaveBeenCalledWith('password', { type: 'server', message: 'Too common.' }, { shouldFocus: true });
    expect(alert).toBeUndefined();
  });

  it('accepts a field named inside the input object', () => {
    const setError = jest.fn<UseFormSetError<Form>>();
    applyServerErrors<Form>(
      graphQLError([{ message: 'Bad address.', extensions: { code: 'BAD_USER_INPUT', field: 'input.email' } }]),
      { setError, fields: ['email', 'password'] },
    );
    expect(setError).toHaveBeenCalledWith('email', { type: 'server', message: 'Bad address.' }, { shouldFocus: true });
  });

  it('maps a code to its field when the server names none', () => {
    const setError = jest.fn<UseFormSetError<Form>>();
    applyServerErrors<Form>(graphQLError([{ message: 'Already registered.', extensions: { code: 'EMAIL_TAKEN' } }]), {
      setError,
      fields: ['email', 'password'],
      fieldForCode: { EMAIL_TAKEN: 'email' },
    });
    expect(setError).toHaveBeenCalledWith('email', expect.objectContaining({ message: 'Already registered.' }), {
      shouldFocus: true,
    });
  });

  it('returns errors that belong to no field as the alert text', () => {
    const setError = jest.fn<UseFormSetError<Form>>();
    const alert = applyServerErrors<Form>(
      graphQLError([{ message: 'Wrong e-mail or password.', extensions: { code: 'INVALID_CREDENTIALS' } }]),
      { setError, fields: ['email', 'password'] },
    );
    expect(alert).toBe('Wrong e-mail or password.');
    expect(setError).not.toHaveBeenCalled();
  });

  it('explains a failure that never reached the server', () => {
    const setError = jest.fn<UseFormSetError<Form>>();
    const alert = applyServerErrors<Form>(new TypeError('Failed to fetch'), { setError, fields: ['email'] });
    expect(alert).toMatch(/could not be reached/);
  });
});
