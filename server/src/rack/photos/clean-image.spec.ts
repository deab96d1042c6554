import { describe, expect, it } from '@jest/globals';

import { jpegLike, pngImage, webpLike } from '../../../test/utils/rack-operations.js';
import { cleanImage } from './clean-image.js';
import { detectImageType } from './detect-image-type.js';
import { exifOrientation } from './exif-orientation.js';

function mustClean(bytes: Buffer) {
  const result = cleanImage(bytes);
  if (!result.ok) throw new Error(result.message);
  return result.image;
}

describe('detectImageType', () => {
  it('names the format from the first bytes, whatever the file is called', () => {
    // Signatures: JPEG FF D8 FF (JFIF/ISO 10918-1), PNG 89 50 4E 47 0D 0A 1A 0A (PNG spec §5.2),
    // WebP "RIFF" size "WEBP" (WebP container specification).
    expect(detectImageType(jpegLike(4, 3))).toBe('image/jpeg');
    expect(detectImageType(pngImage(2, 2))).toBe('image/png');
    expect(detectImageType(webpLike(5, 4))).toBe('image/webp');
    expect(detectImageType(Buffer.from('GIF89a....', 'latin1'))).toBeNull();
  });
});

describe('cleanImage', () => {
  it('refuses a text file renamed to .jpg', () => {
    const result = cleanImage(Buffer.from('grind notes: 15 degrees included\n', 'utf8'));
    expect(result).toEqual({ ok: false, message: expect.stringContaining('not a JPEG, PNG or WebP') });
  });

  it('drops EXIF, XMP, IPTC, comments and the trailer from a JPEG and keeps the colour profile', () => {
    const image = mustClean(jpegLike(640, 480));
    const text = image.bytes.toString('latin1');
    for (const secret of ['Hollowbrook Camera', 'Pell Ashdown', 'Ferncombe', 'boathouse', 'MOTION-TRAILER']) expect(text).not.toContain(secret);
    expect(text).toContain('JFIF');
    expect(text).toContain('ICC_PROFILE');
    // The scan is copied byte for byte, stuffed FF 00 and restart marker FF D0 included.
    expect(image.bytes.includes(Buffer.from([0x12, 0xff, 0x00, 0x34, 0xff, 0xd0, 0x56, 0x78]))).toBe(true);
    expect(image.bytes.subarray(-2)).toEqual(Buffer.from([0xff, 0xd9]));
    expect([image.width, image.height]).toEqual([640, 480]);
  });

  it('keeps only the orientation of a sideways phone photo and reports its upright size', () => {
    // EXIF orientation 6 = turn 90° clockwise to view (EXIF 2.3, tag 0x0112): 640 × 480 stored shows as 480 × 640.
    const image = mustClean(jpegLike(640, 480, { orientation: 6 }));
    const app1 = image.bytes.indexOf(Buffer.from('Exif\0\0', 'latin1'));
    expect(app1).toBeGreaterThan(0);
    expect(exifOrientation(image.bytes.subarray(app1))).toBe(6);
    expect(image.bytes.toString('latin1')).not.toContain('Hollowbrook Camera');
    expect([image.width, image.height]).toEqual([480, 640]);
  });

  it('drops the text chunks of a PNG and leaves every other chunk as it was', () => {
    const tagged = pngImage(3, 2, [
      { type: 'tEXt', data: 'Author\0Pell Ashdown' },
      { type: 'iTXt', data: 'Location\0\0\0\0\0Ferncombe' },
    ]);
    const image = mustClean(tagged);
    expect(image.bytes.equals(pngImage(3, 2))).toBe(true);
    expect([image.width, image.height]).toEqual([3, 2]);
  });

  it('drops the EXIF and XMP chunks of a WebP, clears their flags and fixes the RIFF size', () => {
    const image = mustClean(webpLike(300, 200));
    const text = image.bytes.toString('latin1');
    expect(text).not.toContain('EXIF');
    expect(text).not.toContain('XMP ');
    expect(image.bytes[20]! & 0x0c).toBe(0); // VP8X flags byte: 12-byte RIFF header + 8-byte chunk header
    expect(image.bytes.readUInt32LE(4)).toBe(image.bytes.length - 8);
    expect([image.width, image.height]).toEqual([300, 200]);
  });

  it('calls a cut-off PNG or JPEG damaged rather than accepting it', () => {
    const png = pngImage(4, 4);
    const jpeg = jpegLike(4, 4);
    expect(cleanImage(png.subarray(0, png.length - 12))).toEqual({ ok: false, message: expect.stringContaining('PNG picture but is damaged') });
    expect(cleanImage(jpeg.subarray(0, 120))).toEqual({ ok: false, message: expect.stringContaining('JPEG picture but is damaged') });
  });
});
