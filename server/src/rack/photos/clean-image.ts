import { cleanJpeg } from './clean-jpeg.js';
import { cleanPng } from './clean-png.js';
import { cleanWebp } from './clean-webp.js';
import { detectImageType } from './detect-image-type.js';
import { BrokenImageError, type CleanImage } from './image-types.js';

export type CleanImageResult = { ok: true; image: CleanImage } | { ok: false; message: string };

const CLEANERS = { 'image/jpeg': cleanJpeg, 'image/png': cleanPng, 'image/webp': cleanWebp } as const;
const NAMES = { 'image/jpeg': 'JPEG', 'image/png': 'PNG', 'image/webp': 'WebP' } as const;

/** Checks an upload by its content and strips its metadata; explains a refusal in plain words. */
export function cleanImage(bytes: Buffer): CleanImageResult {
  const type = detectImageType(bytes);
  if (!type) return { ok: false, message: 'That file is not a JPEG, PNG or WebP picture (its content was checked, not its name).' };
  try {
    return { ok: true, image: CLEANERS[type](bytes) };
  } catch (error) {
    if (!(error instanceof BrokenImageError) && !(error instanceof RangeError)) throw error;
    return { ok: false, message: `That file starts like a ${NAMES[type]} picture but is damaged or incomplete; export it again and retry.` };
  }
}
