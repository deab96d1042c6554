import { ErrorCode } from './error-code.js';

/** The HTTP status a REST endpoint answers for each domain error code. */
export function httpStatusFor(code: ErrorCode): number {
  switch (code) {
    case ErrorCode.BadUserInput:
      return 422;
    case ErrorCode.Unauthenticated:
    case ErrorCode.InvalidCredentials:
      return 401;
    case ErrorCode.Forbidden:
      return 403;
    case ErrorCode.NotFound:
      return 404;
    case ErrorCode.Conflict:
    case ErrorCode.EmailTaken:
      return 409;
    case ErrorCode.TooManyAttempts:
      return 429;
    case ErrorCode.TokenInvalid:
      return 400;
    default: {
      const unreachable: never = code;
      return unreachable;
    }
  }
}
