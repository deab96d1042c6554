import type { PhotoMimeValue } from '../entities/axe-photo.entity.js';

/** An image rewritten without its metadata, with the pixel size it is displayed at. */
export interface CleanImage {
  mimeType: PhotoMimeValue;
  bytes: Buffer;
  width: number;
  height: number;
}

/** Thrown for a file that claims a format by its first bytes but does not hold together. */
export class BrokenImageError extends Error {}
