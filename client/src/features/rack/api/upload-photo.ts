import { authToken } from '../../../lib/auth-token.js';
import type { AxePhoto } from './types.js';

/** 8 MiB, the server's limit (server/src/rack/photos/photo-upload.interceptor.ts): checked here first to save a wasted upload. */
export const PHOTO_LIMIT_BYTES = 8 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

export class PhotoUploadError extends Error {}

/** POSTs one photo as multipart/form-data; the server checks the content, strips metadata and answers the photo. */
export async function uploadPhoto(axeId: string, file: File, caption: string): Promise<AxePhoto> {
  if (file.size > PHOTO_LIMIT_BYTES) throw new PhotoUploadError('Photos must be 8 MB or smaller; that file is larger.');
  const form = new FormData();
  form.append('caption', caption);
  form.append('photo', file);
  const token = authToken.get();
  let response: Response;
  try {
    response = await fetch(`/api/rack/axes/${encodeURIComponent(axeId)}/photos`, {
      method: 'POST',
      body: form,
      headers: token ? { authorization: `Bearer ${token}` } : {},
    });
  } catch {
    throw new PhotoUploadError("Endgrain's server could not be reached. Check your connection and try again.");
  }
  const body = (await response.json().catch(() => null)) as (AxePhoto & { message?: string }) | null;
  if (!response.ok) throw new PhotoUploadError(body?.message ?? `The upload failed (${response.status}).`);
  return body as AxePhoto;
}
