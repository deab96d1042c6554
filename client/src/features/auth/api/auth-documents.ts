import { gql, type TypedDocumentNode } from '@apollo/client';

import type { AuthPayload, SignInInput, SignUpInput, UnitSystem, User } from './types.js';

// Every operation asks for the same user fields, so one cached User serves the whole app.
const USER_FIELDS = gql`
  fragment UserFields on User {
    id
    email
    displayName
    role
    emailVerified
    unitSystem
    clubs {
      clubId
      clubName
      role
    }
  }
`;

const me: TypedDocumentNode<{ me: User | null }, Record<string, never>> = gql`
  query Me {
    me {
      ...UserFields
    }
  }
  ${USER_FIELDS}
`;

const signIn: TypedDocumentNode<{ signIn: AuthPayload }, { input: SignInInput }> = gql`
  mutation SignIn($input: SignInInput!) {
    signIn(input: $input) {
      accessToken
      user {
        ...UserFields
      }
    }
  }
  ${USER_FIELDS}
`;

const signUp: TypedDocumentNode<{ signUp: AuthPayload }, { input: SignUpInput }> = gql`
  mutation SignUp($input: SignUpInput!) {
    signUp(input: $input) {
      accessToken
      user {
        ...UserFields
      }
    }
  }
  ${USER_FIELDS}
`;

const verifyEmail: TypedDocumentNode<{ verifyEmail: User }, { token: string }> = gql`
  mutation VerifyEmail($token: String!) {
    verifyEmail(token: $token) {
      ...UserFields
    }
  }
  ${USER_FIELDS}
`;

const resendVerification: TypedDocumentNode<{ resendVerification: boolean }, Record<string, never>> = gql`
  mutation ResendVerification {
    resendVerification
  }
`;

const requestPasswordReset: TypedDocumentNode<{ requestPasswordReset: boolean }, { email: string }> = gql`
  mutation RequestPasswordReset($email: String!) {
    requestPasswordReset(email: $email)
  }
`;

const resetPassword: TypedDocumentNode<{ resetPassword: boolean }, { token: string; password: string }> = gql`
  mutation ResetPassword($token: String!, $password: String!) {
    resetPassword(token: $token, password: $password)
  }
`;

const updateMyPreferences: TypedDocumentNode<
  { updateMyPreferences: User },
  { displayName?: string; unitSystem?: UnitSystem }
> = gql`
  mutation UpdateMyPreferences($displayName: String, $unitSystem: UnitSystem) {
    updateMyPreferences(displayName: $displayName, unitSystem: $unitSystem) {
      ...UserFields
    }
  }
  ${USER_FIELDS}
`;

export const authDocuments = {
  me,
  signIn,
  signUp,
  verifyEmail,
  resendVerification,
  requestPasswordReset,
  resetPassword,
  updateMyPreferences,
};
