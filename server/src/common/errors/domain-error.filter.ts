import { Catch, HttpException, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import { GraphQLError } from 'graphql';
import type { Response } from 'express';

import { DomainError } from './domain-error.js';
import { ErrorCode } from './error-code.js';
import { httpStatusFor } from './http-status.js';

/**
 * The one place domain errors become API errors: GraphQL errors with `extensions.code`
 * for resolvers, JSON bodies with the matching status for REST.
 */
@Catch(DomainError, HttpException)
export class DomainErrorFilter implements ExceptionFilter {
  catch(error: DomainError | HttpException, host: ArgumentsHost): unknown {
    const domain = error instanceof DomainError ? error : fromHttp(error);
    if (host.getType<string>() === 'graphql') {
      return new GraphQLError(domain.message, {
        extensions: { code: domain.code, ...domain.options },
      });
    }
    const response = host.switchToHttp().getResponse<Response>();
    response.status(error instanceof HttpException ? error.getStatus() : httpStatusFor(domain.code)).json({
      code: domain.code,
      message: domain.message,
      ...domain.options,
    });
    return undefined;
  }
}

function fromHttp(error: HttpException): DomainError {
  const status = error.getStatus();
  const code =
    status === 401
      ? ErrorCode.Unauthenticated
      : status === 403
        ? ErrorCode.Forbidden
        : status === 404
          ? ErrorCode.NotFound
          : status === 429
            ? ErrorCode.TooManyAttempts
            : ErrorCode.BadUserInput;
  return new DomainError(code, error.message);
}
