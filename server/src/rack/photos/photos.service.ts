import { randomUUID } from 'node:crypto';
import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';

import { Inject, Injectable } from '@nestjs/common';
import sharp from 'sharp';
import { canReachClub } from '@endgrain/shared';

import type { AuthUser } from '../../common/auth/auth-user.js';
import { DomainError } from '../../common/errors/domain-error.js';
import { APP_CONFIG } from '../../config/load-config.js';
import type { AppConfig } from '../../config/env.schema.js';
import type { PhotoMimeValue } from '../entities/axe-photo.entity.js';
import type { AxePhotoModel } from '../models/axe.model.js';
import { assertCanEditAxe } from '../rack-access.js';
import { toPhotoModel } from '../rack.mappers.js';
import { RackRepository } from '../rack.repository.js';
import { optionalText } from '../rack.validation.js';
import { cleanImage } from './clean-image.js';
import { PHOTO_FIELD } from './photo-upload.interceptor.js';
import { PhotoUrlSigner } from './photo-url-signer.js';

export const PHOTOS_PER_AXE = 12;
export const THUMBNAIL_WIDTH = 320;
const thumbName = (fileName: string): string => fileName.replace(/\.[a-z]+$/, '.thumb.webp');
const EXTENSION: Record<PhotoMimeValue, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export interface UploadedPhoto {
  buffer: Buffer;
}

export interface PhotoFile {
  path: string;
  mimeType: PhotoMimeValue;
  isPublic: boolean;
}

@Injectable()
export class PhotosService {
  private readonly folder: string;

  constructor(
    @Inject(RackRepository) private readonly repo: RackRepository,
    @Inject(PhotoUrlSigner) private readonly signer: PhotoUrlSigner,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    this.folder = resolve(config.UPLOAD_DIR, 'rack');
  }

  async upload(actor: AuthUser, axeId: string, file: UploadedPhoto | undefined, rawCaption: unknown): Promise<AxePhotoModel> {
    const axe = UUID.test(axeId) ? await this.repo.findAxe(axeId) : null;
    if (!axe) throw DomainError.notFound('That axe');
    assertCanEditAxe(actor, axe);
    if (!file || file.buffer.length === 0) throw DomainError.badInput(PHOTO_FIELD, 'Choose a JPEG, PNG or WebP photo to upload.');
    const caption = optionalText('caption', 'Caption', typeof rawCaption === 'string' ? rawCaption : '', 200);
    const cleaned = cleanImage(file.buffer);
    if (!cleaned.ok) throw DomainError.badInput(PHOTO_FIELD, cleaned.message);
    if ((await this.repo.photos().countBy({ axeId })) >= PHOTOS_PER_AXE) {
      throw DomainError.badInput(PHOTO_FIELD, `An axe holds at most ${PHOTOS_PER_AXE} photos; remove one first.`);
    }
    const { image } = cleaned;
    const id = randomUUID();
    const fileName = `${id}.${EXTENSION[image.mimeType]}`;
    await mkdir(this.folder, { recursive: true });
    // Written under a temporary name and renamed, so a reader never sees half a file.
    await writeFile(join(this.folder, `${fileName}.part`), image.bytes);
    await rename(join(this.folder, `${fileName}.part`), join(this.folder, fileName));
    await this.writeThumbnail(image.bytes, fileName);
    try {
      await this.repo.photos().insert({ id, axeId, fileName, mimeType: image.mimeType, byteSize: image.bytes.length, width: image.width, height: image.height, caption, uploadedBy: actor.id });
    } catch (error) {
      await rm(join(this.folder, fileName), { force: true });
      await rm(join(this.folder, thumbName(fileName)), { force: true });
      throw error;
    }
    const row = await this.repo.photos().findOneByOrFail({ id });
    return toPhotoModel(row, this.signer.url(id, { signed: !axe.isPublic }));
  }

  /** The file behind a photo link, for whoever may see the axe or holds a valid signed link. */
  async file(actor: AuthUser | null, photoId: string, exp?: string, sig?: string, size?: string): Promise<PhotoFile> {
    const photo = UUID.test(photoId) ? await this.repo.findPhoto(photoId) : null;
    const allowed = photo && (Boolean(photo.axe.isPublic) || canReachClub(actor, photo.axe.clubId) || this.signer.verify(photo.id, exp, sig));
    if (!photo || !allowed) throw DomainError.notFound('That photo');
    const isPublic = Boolean(photo.axe.isPublic);
    if (size === 'thumb') return { path: join(this.folder, thumbName(photo.fileName)), mimeType: 'image/webp', isPublic };
    return { path: join(this.folder, photo.fileName), mimeType: photo.mimeType, isPublic };
  }

  async remove(actor: AuthUser, photoId: string): Promise<boolean> {
    const photo = UUID.test(photoId) ? await this.repo.findPhoto(photoId) : null;
    if (!photo) throw DomainError.notFound('That photo');
    assertCanEditAxe(actor, photo.axe);
    await this.repo.photos().delete({ id: photoId });
    await rm(join(this.folder, photo.fileName), { force: true });
    await rm(join(this.folder, thumbName(photo.fileName)), { force: true });
    return true;
  }

  /** Deletes the stored files (picture and thumbnail) of photos whose rows are already gone. */
  async removeFiles(fileNames: readonly string[]): Promise<void> {
    for (const fileName of fileNames) {
      await rm(join(this.folder, fileName), { force: true });
      await rm(join(this.folder, thumbName(fileName)), { force: true });
    }
  }

  /** A small WebP for lists: turned upright by the orientation tag, no metadata, never enlarged. */
  private async writeThumbnail(bytes: Buffer, fileName: string): Promise<void> {
    let thumb: Buffer;
    try {
      thumb = await sharp(bytes).rotate().resize({ width: THUMBNAIL_WIDTH, withoutEnlargement: true }).webp({ quality: 80 }).toBuffer();
    } catch {
      await rm(join(this.folder, fileName), { force: true });
      throw DomainError.badInput(PHOTO_FIELD, 'That file could not be read as a picture; export it again as JPEG, PNG or WebP.');
    }
    await writeFile(join(this.folder, `${thumbName(fileName)}.part`), thumb);
    await rename(join(this.folder, `${thumbName(fileName)}.part`), join(this.folder, thumbName(fileName)));
  }
}
