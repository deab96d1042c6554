import { crc32, deflateSync } from 'node:zlib';

import { afterAll, beforeAll } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';

import { gql, type GqlResponse } from './graphql.js';
import { demoToken, lookupIds, type Ids } from './meet-operations.js';
import { createTestApp } from './test-app.js';

export interface RackTestContext {
  app: INestApplication;
  ids: Ids;
  organiser: string;
  /** Larchmere's coach, Cedar Fork's coach and a Larchmere athlete (demo accounts). */
  coach: string;
  otherCoach: string;
  athlete: string;
}

/** Starts the app once for a test file and signs in the demo people the rack tests need. */
export function useRackApp(): RackTestContext {
  const ctx = {} as RackTestContext;
  beforeAll(async () => {
    ctx.app = await createTestApp();
    ctx.ids = await lookupIds(ctx.app);
    [ctx.organiser, ctx.coach, ctx.otherCoach, ctx.athlete] = await Promise.all([
      demoToken(ctx.app, 'organiser@example.org'),
      demoToken(ctx.app, 'coach@example.org'),
      demoToken(ctx.app, 'coach.cedarfork@example.org'),
      demoToken(ctx.app, 'athlete@example.org'),
    ]);
  });
  afterAll(async () => {
    await ctx.app?.close();
  });
  return ctx;
}

// ---- Image builders: real PNGs (deflate + CRC), and JPEG/WebP files with a true structure ----

function pngChunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
  return Buffer.concat([head, data, crc]);
}

/** A decodable RGB PNG of one colour, with optional extra chunks before the pixels. */
export function pngImage(width: number, height: number, extra: { type: string; data: string }[] = []): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit RGB, no interlace
  const row = Buffer.concat([Buffer.from([0]), Buffer.alloc(width * 3, 0x5a)]);
  const pixels = deflateSync(Buffer.concat(Array.from({ length: height }, () => row)));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    ...extra.map((c) => pngChunk(c.type, Buffer.from(c.data, 'latin1'))),
    pngChunk('IDAT', pixels),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

function jpegSegment(marker: number, data: Buffer): Buffer {
  const head = Buffer.from([0xff, marker, 0, 0]);
  head.writeUInt16BE(data.length + 2, 2);
  return Buffer.concat([head, data]);
}

/** EXIF payload (little-endian TIFF) with an orientation tag and a camera-make string. */
export function exifPayload(orientation: number, make = 'Hollowbrook Camera GPS 44.1N'): Buffer {
  const makeBytes = Buffer.from(`${make}\0`, 'latin1');
  const tiff = Buffer.alloc(8 + 2 + 2 * 12 + 4);
  tiff.write('II', 0, 'latin1');
  tiff.writeUInt16LE(0x2a, 2);
  tiff.writeUInt32LE(8, 4);
  tiff.writeUInt16LE(2, 8);
  tiff.writeUInt16LE(0x010f, 10); // Make, ASCII, stored after the IFD
  tiff.writeUInt16LE(2, 12);
  tiff.writeUInt32LE(makeBytes.length, 14);
  tiff.writeUInt32LE(tiff.length, 18);
  tiff.writeUInt16LE(0x0112, 22); // Orientation, SHORT
  tiff.writeUInt16LE(3, 24);
  tiff.writeUInt32LE(1, 26);
  tiff.writeUInt16LE(orientation, 30);
  return Buffer.concat([Buffer.from('Exif\0\0', 'latin1'), tiff, makeBytes]);
}

/**
 * A baseline-JPEG-shaped file: JFIF, EXIF, XMP, IPTC, a comment, tables, a frame of the given
 * size, one scan with a stuffed FF 00 byte and a restart marker, end of image, then a trailer.
 */
export function jpegLike(width: number, height: number, options: { orientation?: number } = {}): Buffer {
  const sof = Buffer.from([8, 0, 0, 0, 0, 1, 1, 0x11, 0]);
  sof.writeUInt16BE(height, 1);
  sof.writeUInt16BE(width, 3);
  return Buffer.concat([
    Buffer.from([0xff, 0xd8]),
    jpegSegment(0xe0, Buffer.from('JFIF\0\x01\x02\0\0\x01\0\x01\0\0', 'latin1')),
    jpegSegment(0xe1, exifPayload(options.orientation ?? 1)),
    jpegSegment(0xe1, Buffer.from('http://ns.adobe.com/xap/1.0/\0<x:creator>Pell Ashdown</x:creator>', 'latin1')),
    jpegSegment(0xed, Buffer.from('Photoshop 3.0\0IPTC city Ferncombe', 'latin1')),
    jpegSegment(0xfe, Buffer.from('shot behind the Larchmere boathouse', 'latin1')),
    jpegSegment(0xe2, Buffer.from('ICC_PROFILE\0\x01\x01profile-bytes', 'latin1')),
    jpegSegment(0xdb, Buffer.alloc(65, 1)),
    jpegSegment(0xc0, sof),
    jpegSegment(0xc4, Buffer.alloc(29, 0)),
    jpegSegment(0xda, Buffer.from([1, 1, 0, 0, 0x3f, 0])),
    Buffer.from([0x12, 0xff, 0x00, 0x34, 0xff, 0xd0, 0x56, 0x78]),
    Buffer.from([0xff, 0xd9]),
    Buffer.from('MOTION-TRAILER', 'latin1'),
  ]);
}

function riffChunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.write(type, 0, 'latin1');
  head.writeUInt32LE(data.length, 4);
  return Buffer.concat([head, data, data.length % 2 ? Buffer.alloc(1) : Buffer.alloc(0)]);
}

/** An extended WebP container: VP8X (with EXIF and XMP flags), a lossless frame, EXIF and XMP chunks. */
export function webpLike(width: number, height: number): Buffer {
  const vp8x = Buffer.alloc(10);
  vp8x[0] = 0x08 | 0x04;
  vp8x.writeUIntLE(width - 1, 4, 3);
  vp8x.writeUIntLE(height - 1, 7, 3);
  const vp8l = Buffer.alloc(9);
  vp8l[0] = 0x2f;
  vp8l.writeUInt32LE(((width - 1) & 0x3fff) | (((height - 1) & 0x3fff) << 14), 1);
  const body = Buffer.concat([
    riffChunk('VP8X', vp8x),
    riffChunk('VP8L', vp8l),
    riffChunk('EXIF', exifPayload(1).subarray(6)),
    riffChunk('XMP ', Buffer.from('<x:creator>Pell Ashdown</x:creator>', 'latin1')),
  ]);
  const head = Buffer.alloc(12);
  head.write('RIFF', 0, 'latin1');
  head.writeUInt32LE(4 + body.length, 4);
  head.write('WEBP', 8, 'latin1');
  return Buffer.concat([head, body]);
}

// ---- GraphQL and REST operations of the Rack ----

export const AXE_FIELDS = `id clubId clubName label maker headWeightG bitWidthMm grind handleLengthMm handleWood hangChecked pinned
  status allowedFor isPublic notes lastServicedOn photoCount
  geometry { includedAngleDeg perSideAngleDeg chiselWidthMm shoulderThicknessMm }`;
const DETAIL_FIELDS = `${AXE_FIELDS} canManage photos { id url width height mimeType byteSize caption }
  services { id kind doneOn doneBy notes changes { field before after } }`;

export interface AxeShape {
  id: string;
  clubId: string;
  label: string;
  status: string;
  allowedFor: string;
  isPublic: boolean;
  grind: string;
  bitWidthMm: number | null;
  headWeightG: number | null;
  lastServicedOn: string | null;
  photoCount: number;
  geometry: { includedAngleDeg: number | null; perSideAngleDeg: number | null; chiselWidthMm: number | null; shoulderThicknessMm: number | null };
}
export interface AxeDetailShape extends AxeShape {
  canManage: boolean;
  photos: { id: string; url: string; width: number; height: number; mimeType: string; byteSize: number; caption: string }[];
  services: { id: string; kind: string; doneOn: string; doneBy: string; notes: string; changes: { field: string; before: string | null; after: string | null }[] }[];
}

let labelCounter = 0;
/** A fresh, invented axe: a 15° included chisel grind with a ¾ in (19.05 mm) chisel. */
export function axeInput(over: Record<string, unknown> = {}): Record<string, unknown> {
  labelCounter += 1;
  return {
    label: `T${process.pid % 1000}-${Date.now().toString(36).slice(-5)}-${labelCounter}`,
    maker: 'Hollowbrook Forge',
    headWeightG: 2495,
    bitWidthMm: 133.35,
    grind: 'CHISEL',
    bevelIncludedDeg: 15,
    chiselWidthMm: 19.05,
    handleLengthMm: 762,
    handleWood: 'hickory',
    hangChecked: true,
    pinned: true,
    status: 'READY',
    allowedFor: 'ANYONE',
    isPublic: false,
    notes: '',
    ...over,
  };
}

export function addAxe(app: INestApplication, token: string, clubId: string, input: Record<string, unknown>) {
  return gql<{ addAxe: AxeDetailShape }>(app, `mutation($c: ID!, $i: AxeInput!) { addAxe(clubId: $c, input: $i) { ${DETAIL_FIELDS} } }`, { c: clubId, i: input }, { token });
}

export function updateAxe(app: INestApplication, token: string, id: string, input: Record<string, unknown>) {
  return gql<{ updateAxe: AxeDetailShape }>(app, `mutation($id: ID!, $i: AxeInput!) { updateAxe(id: $id, input: $i) { ${DETAIL_FIELDS} } }`, { id, i: input }, { token });
}

export function axe(app: INestApplication, id: string, token?: string): Promise<GqlResponse<{ axe: AxeDetailShape }>> {
  return gql(app, `query($id: ID!) { axe(id: $id) { ${DETAIL_FIELDS} } }`, { id }, { token });
}

export function rack(app: INestApplication, clubId: string, options: { token?: string; filter?: Record<string, unknown> } = {}) {
  return gql<{ rack: { clubName: string; canManage: boolean; isMember: boolean; axes: AxeShape[] } }>(
    app,
    `query($c: ID!, $f: RackFilter) { rack(clubId: $c, filter: $f) { clubName canManage isMember axes { ${AXE_FIELDS} } } }`,
    { c: clubId, f: options.filter ?? null },
    { token: options.token },
  );
}

export function logService(app: INestApplication, token: string, input: Record<string, unknown>) {
  return gql<{ logAxeService: AxeDetailShape }>(app, `mutation($i: AxeServiceInput!) { logAxeService(input: $i) { ${DETAIL_FIELDS} } }`, { i: input }, { token });
}

export function deleteAxe(app: INestApplication, token: string, id: string) {
  return gql<{ deleteAxe: boolean }>(app, 'mutation($id: ID!) { deleteAxe(id: $id) }', { id }, { token });
}

export function removeAxePhoto(app: INestApplication, token: string, id: string) {
  return gql<{ removeAxePhoto: boolean }>(app, 'mutation($id: ID!) { removeAxePhoto(id: $id) }', { id }, { token });
}

/** POSTs a multipart upload as a browser form would. */
export function uploadPhoto(app: INestApplication, token: string, axeId: string, file: Buffer, options: { filename?: string; contentType?: string; caption?: string; field?: string } = {}) {
  let req = request(app.getHttpServer()).post(`/api/rack/axes/${axeId}/photos`).set('authorization', `Bearer ${token}`);
  if (options.caption !== undefined) req = req.field('caption', options.caption);
  return req.attach(options.field ?? 'photo', file, { filename: options.filename ?? 'axe.jpg', contentType: options.contentType ?? 'image/jpeg' });
}

export function fetchPhoto(app: INestApplication, url: string, token?: string) {
  const req = request(app.getHttpServer()).get(url).buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });
  return token ? req.set('authorization', `Bearer ${token}`) : req;
}

const ASSIGNMENT = 'entryId athleteId athleteName axeId axeLabel axeStatus override { id reason byName athleteName axeLabel }';

export function assignLineup(app: INestApplication, token: string, input: Record<string, unknown>) {
  return gql<{ assignLineup: { warnings: string[]; assignment: { entryId: string; athleteName: string; axeLabel: string | null; override: { id: string; reason: string; byName: string } | null } } }>(
    app, `mutation($i: AssignLineupInput!) { assignLineup(input: $i) { warnings assignment { ${ASSIGNMENT} } } }`, { i: input }, { token });
}

export function lineup(app: INestApplication, token: string, meetId: string, clubId: string) {
  return gql<{ lineup: { canManage: boolean; entries: { entryId: string; eventName: string; heat: number | null; usesHead: boolean; warnings: string[]; assignment: { axeLabel: string | null; override: { reason: string } | null } | null }[] } }>(
    app, `query($m: ID!, $c: ID!) { lineup(meetId: $m, clubId: $c) { canManage entries { entryId eventName heat usesHead warnings assignment { ${ASSIGNMENT} } } } }`, { m: meetId, c: clubId }, { token });
}

export function lineupOverrides(app: INestApplication, token: string, meetId: string, clubId: string) {
  return gql<{ lineupOverrides: { entryId: string; athleteName: string; athleteExperience: string; axeLabel: string; axeAllowedFor: string; reason: string; byName: string }[] }>(
    app, 'query($m: ID!, $c: ID!) { lineupOverrides(meetId: $m, clubId: $c) { entryId athleteName athleteExperience axeLabel axeAllowedFor reason byName } }', { m: meetId, c: clubId }, { token });
}

export function clearLineupAssignment(app: INestApplication, token: string, entryId: string) {
  return gql<{ clearLineupAssignment: boolean }>(app, 'mutation($e: ID!) { clearLineupAssignment(entryId: $e) }', { e: entryId }, { token });
}

/** A decodable JPEG (drawn by sharp) carrying the same camera metadata and trailer as jpegLike. */
export async function realJpegWithMetadata(width: number, height: number): Promise<Buffer> {
  const { default: sharp } = await import('sharp');
  const plain = await sharp({ create: { width, height, channels: 3, background: '#4a6b3a' } }).jpeg().toBuffer();
  const fake = jpegLike(width, height);
  // jpegLike's metadata segments sit between its SOI and its quantisation table (FF DB).
  const metadata = fake.subarray(2, fake.indexOf(Buffer.from([0xff, 0xdb])));
  return Buffer.concat([plain.subarray(0, 2), metadata, plain.subarray(2), Buffer.from('MOTION-TRAILER', 'latin1')]);
}
