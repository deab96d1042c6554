import { authToken } from '../../../lib/auth-token.js';
import type { UploadedImage } from './types.js';

/** 8 MiB, the server's limit for pictures (the same as axe photos): checked here first to save a wasted upload. */
export const IMAGE_LIMIT_BYTES = 8 * 1024 * 1024;
export const IMAGE_TYPES = ['image/jpeg', 'image/png', 'image/webp'];

/** POST /api/field-notes/images (multipart, field "photo"); the answer carries markdown to paste. */
export async function uploadImage(file: File, alt: string): Promise<UploadedImage> {
  if (file.size > IMAGE_LIMIT_BYTES) throw new Error('Pictures must be 8 MB or smaller; that file is larger.');
  const form = new FormData();
  form.append('alt', alt);
  form.append('photo', file);
  const token = authToken.get();
  const response = await fetch('/api/field-notes/images', { method: 'POST', body: form, headers: token ? { authorization: `Bearer ${token}` } : {} });
  const body = (await response.json().catch(() => null)) as (UploadedImage & { message?: string }) | null;
  if (!response.ok || !body) throw new Error(body?.message ?? `The upload failed (${response.status}).`);
  return body;
}
