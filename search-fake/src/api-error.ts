/** The error types the hosted service's clients switch on. */
export type ErrorType = 'invalid_request' | 'internal' | 'auth' | 'system';

export interface ErrorBody {
  message: string;
  code: string;
  type: ErrorType;
  link: string;
}

// Our own help page address: the fake points at nothing real.
const LINK_BASE = 'https://search-fake.example.org/errors#';

const STATUS_BY_CODE: Record<string, number> = {
  index_not_found: 404,
  document_not_found: 404,
  task_not_found: 404,
  api_key_not_found: 404,
  route_not_found: 404,
  method_not_allowed: 405,
  missing_authorization_header: 401,
  missing_master_key: 401,
  invalid_api_key: 403,
  payload_too_large: 413,
  invalid_content_type: 415,
  internal: 500,
};

const TYPE_BY_CODE: Record<string, ErrorType> = {
  missing_authorization_header: 'auth',
  missing_master_key: 'auth',
  invalid_api_key: 'auth',
  internal: 'internal',
  io_error: 'system',
};

/** An error with the wire shape `{message, code, type, link}` and the HTTP status it travels with. */
export class ApiError extends Error {
  readonly code: string;
  readonly status: number;
  readonly type: ErrorType;

  constructor(code: string, message: string, status?: number) {
    super(message);
    this.name = 'ApiError';
    this.code = code;
    this.status = status ?? STATUS_BY_CODE[code] ?? 400;
    this.type = TYPE_BY_CODE[code] ?? 'invalid_request';
  }

  toBody(): ErrorBody {
    return { message: this.message, code: this.code, type: this.type, link: LINK_BASE + this.code };
  }

  /** Anything thrown, as an ApiError: unexpected faults become `internal`. */
  static from(error: unknown): ApiError {
    if (error instanceof ApiError) return error;
    const message = error instanceof Error ? error.message : String(error);
    return new ApiError('internal', `Internal fault: ${message}`);
  }
}
