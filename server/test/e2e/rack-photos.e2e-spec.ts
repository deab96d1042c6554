import { describe, expect, it } from '@jest/globals';

import { errorCode } from '../utils/graphql.js';
import { recordResult, resultsMeet } from '../utils/results-operations.js';
import { addAxe, axe, axeInput, deleteAxe, fetchPhoto, pngImage, realJpegWithMetadata, removeAxePhoto, uploadPhoto, useRackApp } from '../utils/rack-operations.js';

const LIMIT = 8 * 1024 * 1024; // the product's stated photo limit: 8 MiB

describe('axe photos over REST (real MariaDB, real upload folder)', () => {
  const ctx = useRackApp();
  const newAxe = async (over: Record<string, unknown> = {}) => (await addAxe(ctx.app, ctx.coach, ctx.ids.clubs.LARCH, axeInput(over))).data!.addAxe;


  it('stores a PNG without its text chunks and serves it to the club through a signed link', async () => {
    const a = await newAxe();
    const png = pngImage(24, 16, [{ type: 'tEXt', data: 'Author\0Pell Ashdown' }]);
    const res = await uploadPhoto(ctx.app, ctx.coach, a.id, png, { filename: 'race-axe.png', contentType: 'image/png', caption: 'Left cheek' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ width: 24, height: 16, mimeType: 'image/png', caption: 'Left cheek', byteSize: pngImage(24, 16).length });
    const url = (res.body as { url: string }).url;
    expect(url).toMatch(/\?exp=\d+&sig=[0-9a-f]{64}$/);
    const served = await fetchPhoto(ctx.app, url);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/png');
    expect((served.body as Buffer).equals(pngImage(24, 16))).toBe(true);
    const detail = await axe(ctx.app, a.id, ctx.athlete);
    expect(detail.data?.axe.photos).toHaveLength(1);
    expect(detail.data?.axe.photoCount).toBe(1);
  });

  it('rejects a text file renamed to .jpg with a clear error on the photo field', async () => {
    const a = await newAxe();
    const res = await uploadPhoto(ctx.app, ctx.coach, a.id, Buffer.from('bevel 15, chisel 3/4\n'), { filename: 'notes.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(422);
    expect(res.body).toEqual({ code: 'BAD_USER_INPUT', field: 'photo', message: expect.stringContaining('not a JPEG, PNG or WebP picture') });
  });

  it('rejects a file over the size limit with a clear error on the photo field', async () => {
    const a = await newAxe();
    const big = Buffer.concat([pngImage(1, 1), Buffer.alloc(LIMIT)]);
    const res = await uploadPhoto(ctx.app, ctx.coach, a.id, big, { filename: 'huge.png', contentType: 'image/png' });
    expect(res.status).toBe(422);
    expect(res.body).toEqual({ code: 'BAD_USER_INPUT', field: 'photo', message: 'Photos must be 8 MB or smaller; that file is larger.' });
    expect((await axe(ctx.app, a.id, ctx.coach)).data?.axe.photoCount).toBe(0);
  });

  it('strips EXIF, XMP and the trailer from a JPEG', async () => {
    const a = await newAxe();
    const res = await uploadPhoto(ctx.app, ctx.coach, a.id, await realJpegWithMetadata(800, 600));
    expect(res.status).toBe(201);
    const served = await fetchPhoto(ctx.app, (res.body as { url: string }).url);
    const text = (served.body as Buffer).toString('latin1');
    expect(text).not.toContain('Hollowbrook Camera');
    expect(text).not.toContain('MOTION-TRAILER');
    expect(served.headers['content-type']).toBe('image/jpeg');
  });

  it('keeps a thumbnail at most 320 px wide, without the camera metadata', async () => {
    const a = await newAxe();
    const res = await uploadPhoto(ctx.app, ctx.coach, a.id, await realJpegWithMetadata(800, 600));
    const thumb = await fetchPhoto(ctx.app, (res.body as { thumbnailUrl: string }).thumbnailUrl);
    expect(thumb.headers['content-type']).toBe('image/webp');
    const { default: sharp } = await import('sharp');
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([320, 240]);
    expect(meta.exif).toBeUndefined();
    expect((thumb.body as Buffer).toString('latin1')).not.toContain('Hollowbrook Camera');
  });

  it("keeps a private axe's photo from another club's coach and from visitors", async () => {
    const a = await newAxe();
    const url = ((await uploadPhoto(ctx.app, ctx.coach, a.id, pngImage(4, 4), { contentType: 'image/png', filename: 'a.png' })).body as { url: string }).url;
    const bare = url.split('?')[0]!;
    expect((await fetchPhoto(ctx.app, bare, ctx.otherCoach)).status).toBe(404);
    expect((await fetchPhoto(ctx.app, bare)).status).toBe(404);
    expect((await fetchPhoto(ctx.app, url.replace(/sig=[0-9a-f]/, (m) => (m.endsWith('0') ? 'sig=1' : 'sig=0')))).status).toBe(404);
    expect((await fetchPhoto(ctx.app, bare, ctx.athlete)).status).toBe(200);
    const upload = await uploadPhoto(ctx.app, ctx.otherCoach, a.id, pngImage(4, 4), { contentType: 'image/png', filename: 'b.png' });
    expect(upload.status).toBe(404);
  });

  it("serves a public axe's photo to anyone and refuses uploads from an athlete", async () => {
    const a = await newAxe({ isPublic: true });
    const res = await uploadPhoto(ctx.app, ctx.coach, a.id, pngImage(4, 4), { contentType: 'image/png', filename: 'p.png' });
    expect((res.body as { url: string }).url).not.toContain('sig=');
    expect((await fetchPhoto(ctx.app, (res.body as { url: string }).url)).status).toBe(200);
    expect((await uploadPhoto(ctx.app, ctx.athlete, a.id, pngImage(4, 4), { contentType: 'image/png' })).status).toBe(403);
  });

  it('asks for the photo when the form carries none, and removes a photo on request', async () => {
    const a = await newAxe();
    const wrongField = await uploadPhoto(ctx.app, ctx.coach, a.id, pngImage(2, 2), { field: 'picture', contentType: 'image/png' });
    expect(wrongField.status).toBe(422);
    expect(wrongField.body).toMatchObject({ field: 'photo' });
    const up = await uploadPhoto(ctx.app, ctx.coach, a.id, pngImage(2, 2), { contentType: 'image/png', filename: 'x.png' });
    const photo = up.body as { id: string; url: string };
    expect((await removeAxePhoto(ctx.app, ctx.coach, photo.id)).data?.removeAxePhoto).toBe(true);
    expect((await fetchPhoto(ctx.app, photo.url)).status).toBe(404);
  });

  it('deletes an axe added by mistake with its photos, and sends one with history to retirement instead', async () => {
    const a = await newAxe();
    const photo = (await uploadPhoto(ctx.app, ctx.coach, a.id, pngImage(8, 8))).body as { url: string };
    expect(errorCode(await deleteAxe(ctx.app, ctx.athlete, a.id))).toBe('FORBIDDEN');
    expect(errorCode(await deleteAxe(ctx.app, ctx.otherCoach, a.id))).toBe('NOT_FOUND');
    expect((await deleteAxe(ctx.app, ctx.coach, a.id)).data?.deleteAxe).toBe(true);
    expect(errorCode(await axe(ctx.app, a.id, ctx.coach))).toBe('NOT_FOUND');
    expect((await fetchPhoto(ctx.app, photo.url)).status).toBe(404);

    // An axe that chopped a posted result stays: it is retired, not deleted.
    const used = await newAxe();
    const { athletes } = await resultsMeet(ctx.app, ctx.ids, { organiser: ctx.organiser, coach: ctx.coach, otherCoach: ctx.otherCoach });
    await recordResult(ctx.app, ctx.organiser, { entryId: athletes[0]!.entryId, status: 'FINISHED', times: ['40.00'], axeId: used.id });
    const refused = await deleteAxe(ctx.app, ctx.coach, used.id);
    expect(refused.errors?.[0]).toMatchObject({
      extensions: { code: 'BAD_USER_INPUT', field: 'id' },
      message: `${used.label} is on record in 1 result. Set its status to retired instead, so that history keeps its axe.`,
    });
    expect((await axe(ctx.app, used.id, ctx.coach)).data?.axe.label).toBe(used.label);
  });
});

