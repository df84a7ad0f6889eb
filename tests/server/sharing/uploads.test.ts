import { existsSync, readdirSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, CLIENT, type Agent, type TestApp } from '../helpers/testApp';

const storedFiles = (t: TestApp) => (existsSync(t.config.uploadsDir) ? readdirSync(t.config.uploadsDir) : []);
const uploadRows = async (t: TestApp) => t.db.models.Upload.count();

/** A minimal one-page PDF (PDF 1.4 structure; file-type recognises the "%PDF-" header). */
const PDF = Buffer.from('%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n');

describe('uploads', () => {
  let t: TestApp;
  let designer: Agent;
  let designId: number;
  let png: Buffer;

  beforeAll(async () => {
    t = await buildTestApp();
    designer = await t.signIn('designer');
    designId = (await designer.get('/api/designs')).body.designs[0].id;
    png = await sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 200, g: 120, b: 40 } } }).png().toBuffer();
  });
  afterAll(() => t.close());

  it('keeps a photo under a random name outside the client folder, with a thumbnail, and serves it as a download with nosniff', async () => {
    const sent = await designer.post(`/api/designs/${designId}/uploads`).set(CLIENT).attach('file', png, { filename: 'site photo.png', contentType: 'image/png' });
    expect(sent.status).toBe(201);
    expect(sent.body.upload).toMatchObject({ name: 'site photo.png', mimeType: 'image/png', sizeBytes: png.length });
    const files = storedFiles(t);
    expect(files.some((name) => /^[0-9a-f]{32}$/.test(name))).toBe(true);
    expect(files.some((name) => name.includes('site'))).toBe(false);
    expect(t.config.uploadsDir.startsWith(t.config.clientDist)).toBe(false);

    const download = await designer.get(sent.body.upload.fileUrl);
    expect(download.status).toBe(200);
    expect(download.headers['content-disposition']).toMatch(/^attachment; filename="site photo.png"/);
    expect(download.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(download.body as Buffer, png)).toBe(0);

    const thumbnail = await designer.get(sent.body.upload.thumbnailUrl);
    const meta = await sharp(thumbnail.body as Buffer).metadata();
    expect(meta.format).toBe('webp');
    expect(Math.max(meta.width!, meta.height!)).toBe(320);
  });

  it('accepts a PDF drawing without a thumbnail', async () => {
    const sent = await designer.post(`/api/designs/${designId}/uploads`).set(CLIENT).attach('file', PDF, { filename: 'drawing.pdf', contentType: 'application/pdf' });
    expect(sent.status).toBe(201);
    expect(sent.body.upload.thumbnailUrl).toBeNull();
  });

  it.each([
    ['an oversized file', () => Buffer.concat([png, Buffer.alloc(10 * 1024 * 1024)]), 'big.png', 'image/png', 413],
    ['bytes that do not match the claimed type', () => PDF, 'photo.jpg', 'image/jpeg', 400],
    ['a text file claiming to be an image', () => Buffer.from('<script>alert(1)</script>'), 'x.png', 'image/png', 400],
    ['an archive', () => gzipSync(Buffer.from('hello')), 'photos.gz', 'application/gzip', 400],
    ['a name with folder parts', () => PDF, '../../etc/drawing.pdf', 'application/pdf', 400],
    ['a name with a backslash', () => PDF, 'C:\\temp\\drawing.pdf', 'application/pdf', 400],
  ])('refuses %s and keeps nothing of it', async (_what, bytes, filename, contentType, status) => {
    const filesBefore = storedFiles(t).length;
    const rowsBefore = await uploadRows(t);
    // The multipart body is written by hand: form libraries strip folder parts from names before sending.
    const boundary = 'slotwise-test-boundary';
    const body = Buffer.concat([
      Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${filename}"\r\nContent-Type: ${contentType}\r\n\r\n`),
      bytes(),
      Buffer.from(`\r\n--${boundary}--\r\n`),
    ]);
    const sent = await designer.post(`/api/designs/${designId}/uploads`).set(CLIENT).set('Content-Type', `multipart/form-data; boundary=${boundary}`).send(body);
    expect(sent.status).toBe(status);
    expect(sent.body.error.fields.file).toBeTruthy();
    expect(storedFiles(t).length).toBe(filesBefore);
    expect(await uploadRows(t)).toBe(rowsBefore);
  });

  it('deleting an upload removes its file and thumbnail', async () => {
    const sent = await designer.post(`/api/designs/${designId}/uploads`).set(CLIENT).attach('file', png, { filename: 'delete-me.png', contentType: 'image/png' });
    const filesBefore = storedFiles(t).length;
    expect((await designer.delete(`/api/uploads/${sent.body.upload.id}`).set(CLIENT)).status).toBe(204);
    expect(storedFiles(t).length).toBe(filesBefore - 2);
    expect((await designer.get(sent.body.upload.fileUrl)).status).toBe(404);
    const listed = (await designer.get(`/api/designs/${designId}/uploads`)).body.uploads;
    expect(listed.some((upload: { id: number }) => upload.id === sent.body.upload.id)).toBe(false);
  });
});
