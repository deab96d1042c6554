import { randomUUID } from 'node:crypto';
import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';

import { Inject, Injectable } from '@nestjs/common';
import { canWriteArticles } from '@endgrain/shared';

import type { AuthUser } from '../../common/auth/auth-user.js';
import { DomainError } from '../../common/errors/domain-error.js';
import { APP_CONFIG } from '../../config/load-config.js';
import type { AppConfig } from '../../config/env.schema.js';
import { cleanImage } from '../../rack/photos/clean-image.js';
import { PHOTO_FIELD } from '../../rack/photos/photo-upload.interceptor.js';
import { FieldNotesRepository } from '../field-notes.repository.js';

const EXTENSION: Record<string, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;
export const IMAGE_ROUTE = '/api/field-notes/images';

export interface ArticleImageModel {
  id: string;
  url: string;
  /** Ready to paste into a note. */
  markdown: string;
  mimeType: string;
  width: number;
  height: number;
  byteSize: number;
}

/**
 * Pictures for notes, with the same content checks as axe photos (the Rack's cleaner: format by
 * content, metadata stripped). A picture is served to anyone holding its random id, as a
 * published note's reader must; drafts' pictures are as private as their unguessable ids.
 */
@Injectable()
export class ArticleImagesService {
  private readonly folder: string;

  constructor(
    @Inject(FieldNotesRepository) private readonly repo: FieldNotesRepository,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    this.folder = resolve(config.UPLOAD_DIR, 'field-notes');
  }

  async upload(actor: AuthUser, file: { buffer: Buffer } | undefined, rawAlt: unknown): Promise<ArticleImageModel> {
    if (!canWriteArticles(actor)) throw DomainError.forbidden('Coaches and administrators add pictures to Field Notes.');
    if (!file || file.buffer.length === 0) throw DomainError.badInput(PHOTO_FIELD, 'Choose a JPEG, PNG or WebP picture to upload.');
    const cleaned = cleanImage(file.buffer);
    if (!cleaned.ok) throw DomainError.badInput(PHOTO_FIELD, cleaned.message);
    const { image } = cleaned;
    const id = randomUUID();
    const fileName = `${id}.${EXTENSION[image.mimeType] ?? 'bin'}`;
    await mkdir(this.folder, { recursive: true });
    // Written under a temporary name and renamed, so a reader never sees half a file.
    await writeFile(join(this.folder, `${fileName}.part`), image.bytes);
    await rename(join(this.folder, `${fileName}.part`), join(this.folder, fileName));
    try {
      await this.repo.images.insert({ id, uploadedBy: actor.id, mimeType: image.mimeType, byteSize: image.bytes.length, fileName });
    } catch (error) {
      await rm(join(this.folder, fileName), { force: true });
      throw error;
    }
    const url = `${IMAGE_ROUTE}/${id}`;
    // Brackets would end the markdown alt text early; the renderer escapes everything else.
    const alt = (typeof rawAlt === 'string' ? rawAlt : '').replace(/[[\]\n\r]/g, ' ').trim().slice(0, 120) || 'picture';
    return { id, url, markdown: `![${alt}](${url})`, mimeType: image.mimeType, width: image.width, height: image.height, byteSize: image.bytes.length };
  }

  async file(id: string): Promise<{ path: string; mimeType: string }> {
    const row = UUID.test(id) ? await this.repo.images.findOneBy({ id }) : null;
    if (!row) throw DomainError.notFound('That picture');
    return { path: join(this.folder, row.fileName), mimeType: row.mimeType };
  }
}
