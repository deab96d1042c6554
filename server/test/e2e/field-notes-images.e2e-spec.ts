import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';

import { createNote, noteInput } from '../utils/field-notes-operations.js';
import { demoToken } from '../utils/meet-operations.js';
import { fetchPhoto, pngImage } from '../utils/rack-operations.js';
import { createTestApp } from '../utils/test-app.js';

describe('pictures in Field Notes', () => {
  let app: INestApplication;
  let coach: string;
  let athlete: string;
  const upload = (token: string, file: Buffer, alt?: string) => {
    let req = request(app.getHttpServer()).post('/api/field-notes/images').set('authorization', `Bearer ${token}`);
    if (alt !== undefined) req = req.field('alt', alt);
    return req.attach('photo', file, { filename: 'face.png', contentType: 'image/png' });
  };

  beforeAll(async () => {
    app = await createTestApp();
    [coach, athlete] = (await Promise.all(['coach@example.org', 'athlete@example.org'].map((e) => demoToken(app, e)))) as [string, string];
  });
  afterAll(async () => {
    await app.close();
  });

  it('checks a picture by its content, strips its text chunks and hands back markdown to paste', async () => {
    const res = await upload(coach, pngImage(20, 10, [{ type: 'tEXt', data: 'Comment\0Taken at Larchmere' }]), 'Block face [open]');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ mimeType: 'image/png', width: 20, height: 10, markdown: `![Block face  open](${res.body.url})` });
    const served = await fetchPhoto(app, res.body.url);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/png');
    expect((served.body as Buffer).toString('latin1')).not.toContain('Larchmere');
    // The renderer shows pictures from our own API, so the markdown renders as an image.
    const note = await createNote(app, coach, noteInput({ bodyMarkdown: res.body.markdown }));
    expect(note.data?.createFieldNote.bodyHtml).toContain(`<img src="${res.body.url}"`);
  });

  it('refuses a file that only claims to be a picture, naming the field', async () => {
    const res = await upload(coach, Buffer.from('<svg onload="alert(1)"></svg>'));
    expect(res.status).toBe(422);
    expect(res.body).toMatchObject({ code: 'BAD_USER_INPUT', field: 'photo' });
  });

  it('refuses an athlete uploading', async () => {
    expect((await upload(athlete, pngImage(2, 2))).status).toBe(403);
  });

  it('answers 404 for an unknown picture', async () => {
    expect((await request(app.getHttpServer()).get('/api/field-notes/images/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await request(app.getHttpServer()).get('/api/field-notes/images/..%2F..%2Fetc%2Fpasswd')).status).toBe(404);
  });
});
