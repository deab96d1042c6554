import { Controller, HttpCode, Inject, Param, Post, Query, Res, UploadedFile, UseInterceptors } from '@nestjs/common';
import type { Response } from 'express';

import type { AuthUser } from '../../common/auth/auth-user.js';
import { CurrentUser } from '../../common/auth/current-user.decorator.js';
import { SignedIn } from '../../common/auth/roles.decorator.js';
import { ResultsImportService } from './results-import.service.js';
import type { UploadedSheet } from './sheet-text.js';
import { SheetUploadInterceptor } from './sheet-upload.interceptor.js';

/**
 * POST /api/meets/:id/results/import — multipart field "file" (CSV), optional ?dryRun=true.
 * 200 { imported, unchanged, dryRun, rows }; 422 { errors: [{ row, column, message }] }.
 */
@Controller('api/meets')
export class ResultsImportController {
  constructor(@Inject(ResultsImportService) private readonly importService: ResultsImportService) {}

  @Post(':id/results/import')
  // Organisers and the meet's timekeepers; the service checks which.
  @SignedIn()
  @HttpCode(200)
  @UseInterceptors(SheetUploadInterceptor)
  async import(
    @CurrentUser() actor: AuthUser,
    @Param('id') meetId: string,
    @Query('dryRun') dryRun: string | undefined,
    @UploadedFile() file: UploadedSheet | undefined,
    @Res({ passthrough: true }) res: Response,
  ): Promise<unknown> {
    const outcome = await this.importService.import(actor, meetId, file, { dryRun: dryRun === 'true' || dryRun === '1' });
    if (outcome.ok) return { imported: outcome.imported, unchanged: outcome.unchanged, dryRun: outcome.dryRun, rows: outcome.rows };
    res.status(422);
    const count = outcome.errors.length;
    return { code: 'BAD_USER_INPUT', message: `The sheet has ${count} ${count === 1 ? 'problem' : 'problems'}; nothing was saved.`, errors: outcome.errors };
  }
}
