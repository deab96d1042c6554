import { Body, Controller, Get, HttpCode, Inject, Param, Post, Res, UploadedFile, UseInterceptors } from '@nestjs/common';
import type { Response } from 'express';

import type { AuthUser } from '../../common/auth/auth-user.js';
import { CurrentUser } from '../../common/auth/current-user.decorator.js';
import { Public } from '../../common/auth/public.decorator.js';
import { Roles } from '../../common/auth/roles.decorator.js';
import { PhotoUploadInterceptor } from '../../rack/photos/photo-upload.interceptor.js';
import { ArticleImagesService, type ArticleImageModel } from './article-images.service.js';

/** REST for note pictures: multipart upload (the same form field and limits as axe photos) and the bytes. */
@Controller('api/field-notes/images')
export class ArticleImagesController {
  constructor(@Inject(ArticleImagesService) private readonly images: ArticleImagesService) {}

  /** POST multipart/form-data with the file in "photo" and an optional "alt" text. */
  @Post()
  @Roles('COACH')
  @HttpCode(201)
  @UseInterceptors(PhotoUploadInterceptor)
  upload(@CurrentUser() actor: AuthUser, @UploadedFile() file: { buffer: Buffer } | undefined, @Body() body: Record<string, unknown> | undefined): Promise<ArticleImageModel> {
    return this.images.upload(actor, file, body?.alt);
  }

  @Get(':id')
  @Public()
  async image(@Param('id') id: string, @Res() res: Response): Promise<void> {
    const file = await this.images.file(id);
    res.setHeader('content-type', file.mimeType);
    res.setHeader('cache-control', 'public, max-age=86400, immutable');
    res.setHeader('content-disposition', 'inline');
    res.sendFile(file.path, { dotfiles: 'allow' }, (error) => {
      if (error && !res.headersSent) res.status(404).json({ code: 'NOT_FOUND', message: 'That picture file is missing.' });
    });
  }
}
