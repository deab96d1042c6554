const ORIENTATION_TAG = 0x0112;

/**
 * The orientation (1–8) in an APP1 EXIF payload ("Exif\0\0" + TIFF), 1 when the tag is absent or
 * unreadable, null when the payload is not EXIF (XMP shares the APP1 marker). Phones store
 * portrait photos sideways and set this tag to turn them upright.
 */
export function exifOrientation(app1: Buffer): number | null {
  if (app1.length < 14 || app1.toString('latin1', 0, 6) !== 'Exif\0\0') return null;
  const tiff = app1.subarray(6);
  const order = tiff.toString('latin1', 0, 2);
  if (order !== 'II' && order !== 'MM') return 1;
  const u16 = (at: number) => (order === 'II' ? tiff.readUInt16LE(at) : tiff.readUInt16BE(at));
  const u32 = (at: number) => (order === 'II' ? tiff.readUInt32LE(at) : tiff.readUInt32BE(at));
  const ifd = u32(4);
  if (ifd + 2 > tiff.length) return 1;
  const count = u16(ifd);
  for (let k = 0; k < count; k += 1) {
    const entry = ifd + 2 + k * 12;
    if (entry + 12 > tiff.length) return 1;
    if (u16(entry) === ORIENTATION_TAG) {
      const value = u16(entry + 8);
      return value >= 1 && value <= 8 ? value : 1;
    }
  }
  return 1;
}

/** An APP1 segment holding nothing but the orientation tag (big-endian TIFF, one IFD entry). */
export function orientationOnlyApp1(orientation: number): Buffer {
  const data = Buffer.alloc(32);
  data.write('Exif\0\0', 0, 'latin1');
  data.write('MM', 6, 'latin1');
  data.writeUInt16BE(0x002a, 8);
  data.writeUInt32BE(8, 10); // IFD0 straight after the 8-byte TIFF header
  data.writeUInt16BE(1, 14); // one entry
  data.writeUInt16BE(ORIENTATION_TAG, 16);
  data.writeUInt16BE(3, 18); // type SHORT
  data.writeUInt32BE(1, 20); // count 1
  data.writeUInt16BE(orientation, 24); // value, left-justified in the 4-byte field
  // bytes 28–31: offset of the next IFD, 0 for none
  const header = Buffer.from([0xff, 0xe1, 0, 0]);
  header.writeUInt16BE(data.length + 2, 2);
  return Buffer.concat([header, data]);
}
