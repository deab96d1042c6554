import { BrokenImageError, type CleanImage } from './image-types.js';

const VP8X_EXIF = 0x08;
const VP8X_XMP = 0x04;

function frameSize(type: string, data: Buffer): { width: number; height: number } | null {
  if (type === 'VP8X' && data.length >= 10) return { width: data.readUIntLE(4, 3) + 1, height: data.readUIntLE(7, 3) + 1 };
  if (type === 'VP8 ' && data.length >= 10 && data[3] === 0x9d && data[4] === 0x01 && data[5] === 0x2a) {
    return { width: data.readUInt16LE(6) & 0x3fff, height: data.readUInt16LE(8) & 0x3fff };
  }
  if (type === 'VP8L' && data.length >= 5 && data[0] === 0x2f) {
    const bits = data.readUInt32LE(1);
    return { width: (bits & 0x3fff) + 1, height: ((bits >>> 14) & 0x3fff) + 1 };
  }
  return null;
}

/** Rewrites a WebP without its EXIF and XMP chunks (and clears their flags in the VP8X header). */
export function cleanWebp(bytes: Buffer): CleanImage {
  const riffEnd = 8 + bytes.readUInt32LE(4);
  if (riffEnd > bytes.length) throw new BrokenImageError('WebP is shorter than its header says');
  const chunks: Buffer[] = [];
  let size: { width: number; height: number } | null = null;
  let i = 12;
  while (i < riffEnd) {
    if (i + 8 > riffEnd) throw new BrokenImageError('WebP chunk header is cut off');
    const type = bytes.toString('latin1', i, i + 4);
    const length = bytes.readUInt32LE(i + 4);
    const end = i + 8 + length + (length % 2); // chunks are padded to an even length
    if (i + 8 + length > riffEnd) throw new BrokenImageError(`WebP chunk ${type} runs past the end of the file`);
    const chunk = Buffer.from(bytes.subarray(i, Math.min(end, riffEnd)));
    size ??= frameSize(type, chunk.subarray(8));
    if (type === 'VP8X') chunk[8] = chunk[8]! & ~(VP8X_EXIF | VP8X_XMP);
    if (type !== 'EXIF' && type !== 'XMP ') chunks.push(chunk);
    i = end;
  }
  if (!size || size.width === 0 || size.height === 0) throw new BrokenImageError('WebP has no picture data');
  const body = Buffer.concat(chunks);
  const header = Buffer.alloc(12);
  header.write('RIFF', 0, 'latin1');
  header.writeUInt32LE(4 + body.length, 4);
  header.write('WEBP', 8, 'latin1');
  return { mimeType: 'image/webp', bytes: Buffer.concat([header, body]), width: size.width, height: size.height };
}
