/** Every domain error code the API can return (as GraphQL `extensions.code`). */
export enum ErrorCode {
  BadUserInput = 'BAD_USER_INPUT',
  Unauthenticated = 'UNAUTHENTICATED',
  Forbidden = 'FORBIDDEN',
  NotFound = 'NOT_FOUND',
  Conflict = 'CONFLICT',
  EmailTaken = 'EMAIL_TAKEN',
  InvalidCredentials = 'INVALID_CREDENTIALS',
  TooManyAttempts = 'TOO_MANY_ATTEMPTS',
  TokenInvalid = 'TOKEN_INVALID',
}
