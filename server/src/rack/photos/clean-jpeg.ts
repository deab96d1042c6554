import { exifOrientation, orientationOnlyApp1 } from './exif-orientation.js';
import { BrokenImageError, type CleanImage } from './image-types.js';

const SOI = 0xd8;
const EOI = 0xd9;
const SOS = 0xda;
const APP0 = 0xe0;
const APP1 = 0xe1;
const APP2 = 0xe2;
const APP14 = 0xee;
const isRestart = (m: number) => m >= 0xd0 && m <= 0xd7;
// Start-of-frame markers carry the pixel size; C4 (Huffman), C8 (reserved) and CC (arithmetic) do not.
const isStartOfFrame = (m: number) => m >= 0xc0 && m <= 0xcf && m !== 0xc4 && m !== 0xc8 && m !== 0xcc;

/** Keeps what decoding needs: JFIF, the colour profile and Adobe's colour-transform flag. */
function keepApp(marker: number, segment: Buffer): boolean {
  if (marker === APP0 || marker === APP14) return true;
  return marker === APP2 && segment.toString('latin1', 4, 16) === 'ICC_PROFILE\0';
}

/**
 * Rewrites a JPEG without EXIF, XMP, IPTC, comments and vendor segments (camera, GPS,
 * software), and without anything after the end-of-image marker. The orientation is kept as a
 * one-tag EXIF block so phone photos still show upright.
 */
export function cleanJpeg(bytes: Buffer): CleanImage {
  const parts: Buffer[] = [bytes.subarray(0, 2)];
  let i = 2;
  let width = 0;
  let height = 0;
  let orientation = 1;
  let headerEnd = 1; // index in parts after which the orientation block goes
  let scanned = false;
  for (;;) {
    if (i + 1 >= bytes.length || bytes[i] !== 0xff) throw new BrokenImageError('JPEG ends before its end-of-image marker');
    while (bytes[i + 1] === 0xff && i + 2 < bytes.length) i += 1; // fill bytes
    const marker = bytes[i + 1]!;
    if (marker === EOI) {
      parts.push(Buffer.from([0xff, EOI]));
      break;
    }
    if (marker === SOI || isRestart(marker) || marker === 0x01) {
      parts.push(bytes.subarray(i, i + 2));
      i += 2;
      continue;
    }
    if (i + 4 > bytes.length) throw new BrokenImageError('JPEG segment header is cut off');
    const end = i + 2 + bytes.readUInt16BE(i + 2);
    if (end > bytes.length || end < i + 4) throw new BrokenImageError('JPEG segment runs past the end of the file');
    const segment = bytes.subarray(i, end);
    if (isStartOfFrame(marker) && segment.length >= 9) {
      height = segment.readUInt16BE(5);
      width = segment.readUInt16BE(7);
    }
    if (marker === APP1) orientation = exifOrientation(segment.subarray(4)) ?? orientation;
    const isApp = marker >= 0xe0 && marker <= 0xef;
    if (marker === SOS) {
      scanned = true;
      let j = end;
      // Entropy-coded data: 0xFF is stuffed as FF 00, so the next real marker ends the scan.
      while (j + 1 < bytes.length && !(bytes[j] === 0xff && bytes[j + 1] !== 0x00 && !isRestart(bytes[j + 1]!))) j += 1;
      parts.push(bytes.subarray(i, j));
      i = j;
      continue;
    }
    if ((isApp && keepApp(marker, segment)) || (!isApp && marker !== 0xfe)) {
      parts.push(segment);
      if (marker === APP0 && parts.length === 2) headerEnd = 2;
    }
    i = end;
  }
  if (!scanned || width === 0 || height === 0) throw new BrokenImageError('JPEG has no picture data');
  if (orientation !== 1) parts.splice(headerEnd, 0, orientationOnlyApp1(orientation));
  const turned = orientation >= 5; // 5–8 turn the picture a quarter, swapping width and height
  return { mimeType: 'image/jpeg', bytes: Buffer.concat(parts), width: turned ? height : width, height: turned ? width : height };
}
