import {
  BadRequestException,
  HttpException,
  Injectable,
  PayloadTooLargeException,
  UnsupportedMediaTypeException,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';

import { DomainError } from '../../common/errors/domain-error.js';

/** 8 MiB: a full-size phone photo fits; a video renamed to .jpg does not. */
export const PHOTO_LIMIT_BYTES = 8 * 1024 * 1024;
export const PHOTO_FIELD = 'photo';

/**
 * multer (bundled with the platform) reading one file into memory, with its refusals turned
 * into field-named domain errors so the client gets the same JSON shape as for every other error.
 */
@Injectable()
export class PhotoUploadInterceptor implements NestInterceptor {
  private readonly multer = new (FileInterceptor(PHOTO_FIELD, { limits: { fileSize: PHOTO_LIMIT_BYTES, files: 1, fields: 4 } }))();

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await this.multer.intercept(context, next);
    } catch (error) {
      throw uploadError(error);
    }
  }
}

function uploadError(error: unknown): unknown {
  if (error instanceof PayloadTooLargeException) {
    return DomainError.badInput(PHOTO_FIELD, `Photos must be ${PHOTO_LIMIT_BYTES / 1024 / 1024} MB or smaller; that file is larger.`);
  }
  if (error instanceof UnsupportedMediaTypeException) {
    return DomainError.badInput(PHOTO_FIELD, 'Send the photo as a multipart/form-data upload.');
  }
  if (error instanceof BadRequestException) {
    return DomainError.badInput(PHOTO_FIELD, `Send one picture, in the form field "${PHOTO_FIELD}".`);
  }
  return error instanceof HttpException ? DomainError.badInput(PHOTO_FIELD, error.message) : error;
}
