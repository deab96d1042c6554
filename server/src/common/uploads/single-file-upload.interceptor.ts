import {
  BadRequestException,
  HttpException,
  Injectable,
  PayloadTooLargeException,
  UnsupportedMediaTypeException,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
  type Type,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';

import { DomainError } from '../errors/domain-error.js';

export interface SingleFileUpload {
  /** The multipart form field that carries the file. */
  field: string;
  limitBytes: number;
  /** What the refusal says: too large, not a multipart upload, not exactly one file in the field. */
  messages: { tooLarge: string; notMultipart: string; notOneFile: string };
}

/**
 * An interceptor class: multer (bundled with the platform) reading one file into memory, with
 * its refusals turned into field-named domain errors, so the client gets the same JSON shape as
 * for every other error.
 */
export function singleFileUploadInterceptor({ field, limitBytes, messages }: SingleFileUpload): Type<NestInterceptor> {
  const Multer = FileInterceptor(field, { limits: { fileSize: limitBytes, files: 1, fields: 4 } });

  @Injectable()
  class SingleFileUploadInterceptor implements NestInterceptor {
    private readonly multer = new Multer();

    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      try {
        return await this.multer.intercept(context, next);
      } catch (error) {
        throw refusal(error);
      }
    }
  }

  function refusal(error: unknown): unknown {
    if (error instanceof PayloadTooLargeException) return DomainError.badInput(field, messages.tooLarge);
    if (error instanceof UnsupportedMediaTypeException) return DomainError.badInput(field, messages.notMultipart);
    if (error instanceof BadRequestException) return DomainError.badInput(field, messages.notOneFile);
    return error instanceof HttpException ? DomainError.badInput(field, error.message) : error;
  }

  return SingleFileUploadInterceptor;
}
