import { Body, Controller, Get, HttpCode, Inject, Param, Post, Query, Res, UploadedFile, UseInterceptors } from '@nestjs/common';
import type { Response } from 'express';

import type { AuthUser } from '../../common/auth/auth-user.js';
import { CurrentUser } from '../../common/auth/current-user.decorator.js';
import { Public } from '../../common/auth/public.decorator.js';
import { Roles } from '../../common/auth/roles.decorator.js';
import type { AxePhotoModel } from '../models/axe.model.js';
import { PhotoUploadInterceptor } from './photo-upload.interceptor.js';
import { PhotosService, type UploadedPhoto } from './photos.service.js';

/** REST for what GraphQL carries badly: photo uploads (multipart) and the image bytes. */
@Controller('api/rack')
export class PhotosController {
  constructor(@Inject(PhotosService) private readonly photos: PhotosService) {}

  /** POST multipart/form-data with the file in "photo" and an optional "caption". */
  @Post('axes/:axeId/photos')
  @Roles('COACH')
  @HttpCode(201)
  @UseInterceptors(PhotoUploadInterceptor)
  upload(
    @CurrentUser() actor: AuthUser,
    @Param('axeId') axeId: string,
    @UploadedFile() file: UploadedPhoto | undefined,
    @Body() body: Record<string, unknown> | undefined,
  ): Promise<AxePhotoModel> {
    return this.photos.upload(actor, axeId, file, body?.caption);
  }

  /** Open route: the service checks the axe's visibility, a member's token or a signed link. */
  @Get('photos/:photoId')
  @Public()
  async photo(
    @CurrentUser() actor: AuthUser | null,
    @Param('photoId') photoId: string,
    @Query('exp') exp: string | undefined,
    @Query('sig') sig: string | undefined,
    @Query('size') size: string | undefined,
    @Res() res: Response,
  ): Promise<void> {
    const file = await this.photos.file(actor, photoId, exp, sig, size);
    res.setHeader('content-type', file.mimeType);
    res.setHeader('cache-control', `${file.isPublic ? 'public' : 'private'}, max-age=3600`);
    res.setHeader('content-disposition', 'inline');
    // The upload folder may sit under a dot-folder (.data/uploads); the path is ours, not the caller's.
    res.sendFile(file.path, { dotfiles: 'allow' }, (error) => {
      if (error && !res.headersSent) res.status(404).json({ code: 'NOT_FOUND', message: 'That photo file is missing.' });
    });
  }
}
