import { ErrorCode } from './error-code.js';

export interface DomainErrorOptions {
  /** The input field the error is about, so the client can show it beside that field. */
  field?: string;
  /** Seconds until the caller may try again (throttling). */
  retryAfterSeconds?: number;
}

/** A rule broken by the caller: carries a code and a message fit to show a user. */
export class DomainError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly options: DomainErrorOptions = {},
  ) {
    super(message);
    this.name = 'DomainError';
  }

  static badInput(field: string, message: string): DomainError {
    return new DomainError(ErrorCode.BadUserInput, message, { field });
  }

  static notFound(what: string): DomainError {
    return new DomainError(ErrorCode.NotFound, `${what} was not found.`);
  }

  static forbidden(message = 'You do not have permission to do that.'): DomainError {
    return new DomainError(ErrorCode.Forbidden, message);
  }
}
