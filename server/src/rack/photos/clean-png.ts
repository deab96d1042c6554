import { BrokenImageError, type CleanImage } from './image-types.js';

// Text, EXIF and timestamp chunks: where cameras and editors put authors, places and software.
const DROPPED = new Set(['tEXt', 'zTXt', 'iTXt', 'eXIf', 'tIME']);

/** Rewrites a PNG without its text, EXIF and time chunks and without anything after IEND. */
export function cleanPng(bytes: Buffer): CleanImage {
  const parts: Buffer[] = [bytes.subarray(0, 8)];
  let i = 8;
  let width = 0;
  let height = 0;
  for (let first = true; ; first = false) {
    if (i + 12 > bytes.length) throw new BrokenImageError('PNG ends before its IEND chunk');
    const length = bytes.readUInt32BE(i);
    const type = bytes.toString('latin1', i + 4, i + 8);
    const end = i + 12 + length;
    if (end > bytes.length) throw new BrokenImageError(`PNG chunk ${type} runs past the end of the file`);
    if (first) {
      if (type !== 'IHDR' || length !== 13) throw new BrokenImageError('PNG does not start with its header chunk');
      width = bytes.readUInt32BE(i + 8);
      height = bytes.readUInt32BE(i + 12);
    }
    if (!DROPPED.has(type)) parts.push(bytes.subarray(i, end));
    i = end;
    if (type === 'IEND') break;
  }
  if (width === 0 || height === 0) throw new BrokenImageError('PNG has no pixels');
  return { mimeType: 'image/png', bytes: Buffer.concat(parts), width, height };
}
