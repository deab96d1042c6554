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

/** 5 MiB: 20,000 result rows with every column filled fit with room to spare. */
export const SHEET_LIMIT_BYTES = 5 * 1024 * 1024;
export const SHEET_FIELD = 'file';

/** multer (bundled with the platform) reading one sheet into memory; refusals become field-named errors. */
@Injectable()
export class SheetUploadInterceptor implements NestInterceptor {
  private readonly multer = new (FileInterceptor(SHEET_FIELD, { limits: { fileSize: SHEET_LIMIT_BYTES, files: 1, fields: 4 } }))();

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
    return DomainError.badInput(SHEET_FIELD, `A results sheet must be ${SHEET_LIMIT_BYTES / 1024 / 1024} MB or smaller; split a larger one.`);
  }
  if (error instanceof UnsupportedMediaTypeException) return DomainError.badInput(SHEET_FIELD, 'Send the sheet as a multipart/form-data upload.');
  if (error instanceof BadRequestException) return DomainError.badInput(SHEET_FIELD, `Send one CSV file, in the form field "${SHEET_FIELD}".`);
  return error instanceof HttpException ? DomainError.badInput(SHEET_FIELD, error.message) : error;
}
