// Case attachments through their router on a small Express app (the session is replaced by a header
// naming a test user), against the real database and real files in a temporary directory.
import { randomBytes, randomInt } from 'node:crypto';
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import express, { type RequestHandler } from 'express';
import pg from 'pg';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { UserRole } from '@railyard/shared';
import { readEnv } from '../../apps/api/src/config/env';
import { createDatabase } from '../../apps/api/src/db/client';
import { createLogger } from '../../apps/api/src/lib/logger';
import { errorHandler, notFoundHandler } from '../../apps/api/src/middleware/error-handler';
import { createLocalDiskStorage } from '../../apps/api/src/modules/attachments/attachment-storage';
import { createAttachmentsRepository } from '../../apps/api/src/modules/attachments/attachments.repository';
import { attachmentsRouter } from '../../apps/api/src/modules/attachments/attachments.routes';
import { createAttachmentsService } from '../../apps/api/src/modules/attachments/attachments.service';
import { samplePdf, samplePng } from '../support/sample-files';

const maxBytes = 300 * 1024;
const maxFiles = 3;

let pool: pg.Pool;
let dir: string;
let app: express.Express;
const people = new Map<number, Express.User>();
const boardIds: number[] = [];

beforeAll(async () => {
  pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 4 });
  dir = await mkdtemp(path.join(tmpdir(), 'railyard-attachments-'));
  const logger = createLogger('silent');
  const service = createAttachmentsService({
    repo: createAttachmentsRepository(createDatabase(pool)),
    storage: createLocalDiskStorage(dir),
    logger,
  });
  const pass: RequestHandler = (_req, _res, next) => next();
  // stands in for the session: the person named by X-Test-User is signed in
  const signedIn: RequestHandler = (req, _res, next) => {
    const id = Number(req.get('x-test-user'));
    if (people.has(id)) req.user = people.get(id);
    next();
  };
  app = express();
  app.use(signedIn);
  const api = express.Router();
  api.use(attachmentsRouter(service, { maxBytes, maxFiles, uploadLimit: pass, writeLimit: pass }));
  api.use(notFoundHandler);
  app.use('/api', api);
  app.use(errorHandler(logger));
});

afterAll(async () => {
  // the cases and their attachment rows go with the boards; later test files find none of them
  await pool.query('DELETE FROM boards WHERE id = ANY($1)', [boardIds]);
  await pool.end();
  await rm(dir, { recursive: true, force: true });
});

async function person(role: UserRole = 'member'): Promise<Express.User> {
  const login = `tech-${randomBytes(4).toString('hex')}`;
  const { rows } = await pool.query<{ id: number }>(
    'INSERT INTO users (github_id, login, name, role) VALUES ($1, $2, $3, $4) RETURNING id',
    [randomInt(100_000_000, 2_000_000_000), login, `Test ${role}`, role],
  );
  const user = { id: rows[0]!.id, login, name: `Test ${role}`, avatarUrl: '', role, banned: false };
  people.set(user.id, user);
  return user;
}

async function caseBy(
  author: Express.User,
  status: 'draft' | 'published' = 'published',
): Promise<number> {
  const board = await pool.query<{ id: number }>(
    'INSERT INTO boards (slug, title) VALUES ($1, $2) RETURNING id',
    [`attach-${randomBytes(4).toString('hex')}`, 'Invented test board'],
  );
  boardIds.push(board.rows[0]!.id);
  const { rows } = await pool.query<{ id: number }>(
    `INSERT INTO cases (board_id, author_id, status, title, symptom, outcome) VALUES ($1, $2, $3, 'No power', 'VSYS shorted to GND', 'solved') RETURNING id`,
    [board.rows[0]!.id, author.id, status],
  );
  return rows[0]!.id;
}

const as = (user: Express.User | null) => ({ 'X-Test-User': user ? String(user.id) : '' });

async function jpegWithGps(): Promise<Buffer> {
  return sharp({
    create: { width: 640, height: 480, channels: 3, background: { r: 30, g: 90, b: 40 } },
  })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Bench camera' },
      IFD3: {
        GPSLatitudeRef: 'N',
        GPSLatitude: '48/1 8/1 0/1',
        GPSLongitudeRef: 'E',
        GPSLongitude: '11/1 34/1 0/1',
      },
    })
    .toBuffer();
}



async function storedFiles(): Promise<string[]> {
  const found: string[] = [];
  for (const fan of await readdir(dir)) found.push(...(await readdir(path.join(dir, fan))));
  return found;
}

async function rowsOf(caseId: number) {
  const { rows } = await pool.query(
    'SELECT * FROM case_attachments WHERE case_id = $1 ORDER BY id',
    [caseId],
  );
  return rows;
}

function binary(res: request.Response, cb: (err: Error | null, body: Buffer) => void) {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}

async function download(url: string, user: Express.User | null = null) {
  return request(app).get(url).set(as(user)).buffer(true).parse(binary);
}

describe('uploading attachments to a case', () => {
  it('accepts photos from the author, strips their EXIF GPS, makes thumbnails and serves them with safe headers', async () => {
    const author = await person();
    const caseId = await caseBy(author);

    const res = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('files', await jpegWithGps(), {
        filename: 'board top.jpg',
        contentType: 'image/jpeg',
      })
      .attach('files', await samplePng(), {
        filename: 'thermal.png',
        contentType: 'application/octet-stream',
      });

    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.attachments).toHaveLength(2);
    const [photo, thermal] = res.body.attachments;
    expect(photo).toMatchObject({
      caseId,
      uploaderId: author.id,
      name: 'board top.jpg',
      contentType: 'image/jpeg',
      width: 640,
      height: 480,
    });
    expect(photo.url).toBe(`/api/attachments/${photo.id}`);
    expect(photo.thumbnailUrl).toBe(`/api/attachments/${photo.id}/thumbnail`);
    // the client said octet-stream; the bytes say PNG
    expect(thermal).toMatchObject({
      name: 'thermal.png',
      contentType: 'image/png',
      width: 200,
      height: 100,
    });

    const served = await download(photo.url);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect(served.headers['content-disposition']).toBe('inline; filename="board top.jpg"');
    expect(served.headers['cache-control']).toMatch(/^private, max-age=\d+$/);
    expect(served.headers['content-security-policy']).toBe("default-src 'none'; sandbox");
    const meta = await sharp(served.body as Buffer).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(Number(served.headers['content-length'])).toBe((served.body as Buffer).length);

    const thumb = await download(photo.thumbnailUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    expect(thumb.headers['content-security-policy']).toBe("default-src 'none'; sandbox");
    const thumbMeta = await sharp(thumb.body as Buffer).metadata();
    expect(thumbMeta.format).toBe('webp');
    expect(Math.max(thumbMeta.width, thumbMeta.height)).toBe(480);
    expect(thumbMeta.exif).toBeUndefined();

    const rows = await rowsOf(caseId);
    expect(rows.map((r) => r.byte_size)).toEqual(
      res.body.attachments.map((a: { byteSize: number }) => a.byteSize),
    );
  });

  it('accepts a PDF without a thumbnail and serves it as a download', async () => {
    const author = await person();
    const caseId = await caseBy(author);
    const bytes = samplePdf();

    const res = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('files', bytes, 'ldo datasheet.pdf');

    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const [doc] = res.body.attachments;
    expect(doc).toMatchObject({
      contentType: 'application/pdf',
      thumbnailUrl: null,
      width: null,
      height: null,
      byteSize: bytes.length,
    });
    const served = await download(doc.url);
    expect(served.headers['content-type']).toBe('application/pdf');
    expect(served.headers['content-disposition']).toBe('attachment; filename="ldo datasheet.pdf"');
    expect(served.headers['content-security-policy']).toBe("default-src 'none'; sandbox");
    expect((served.body as Buffer).equals(bytes)).toBe(true);
    const noThumb = await request(app).get(`/api/attachments/${doc.id}/thumbnail`);
    expect(noThumb.status).toBe(404);
    expect(noThumb.body.error.message).toBe(
      `Attachment ${doc.id} (application/pdf) has no thumbnail`,
    );
  });

  it.each([
    ['HTML', Buffer.from('<!doctype html><html><script>fetch("/api/me")</script></html>')],
    ['SVG', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>')],
  ])(
    'refuses %s renamed to photo.jpg with 415 and stores nothing, not even the valid file beside it',
    async (_kind, bytes) => {
      const author = await person();
      const caseId = await caseBy(author);
      const before = await storedFiles();

      const res = await request(app)
        .post(`/api/cases/${caseId}/attachments`)
        .set(as(author))
        .attach('files', await samplePng(), 'fine.png')
        .attach('files', bytes, { filename: 'photo.jpg', contentType: 'image/jpeg' });

      expect(res.status).toBe(415);
      expect(res.body.error.code).toBe('unsupported_media_type');
      expect(res.body.error.message).toMatch(
        /^"photo\.jpg" is not a JPEG, PNG, WebP, GIF or PDF file/,
      );
      expect(await rowsOf(caseId)).toEqual([]);
      expect(await storedFiles()).toEqual(before);
    },
  );

  it('refuses a file over the size limit with 413 naming the file', async () => {
    const author = await person();
    const caseId = await caseBy(author);

    const res = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('files', Buffer.alloc(maxBytes + 1), 'huge-scope-capture.png');

    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({
      code: 'file_too_large',
      message: '"huge-scope-capture.png" is larger than 0.3 MiB, the most a file may have',
    });
    expect(await rowsOf(caseId)).toEqual([]);
  });

  it('takes a file of exactly the size limit', async () => {
    const author = await person();
    const caseId = await caseBy(author);
    // a PDF padded with a comment to the limit (ISO 32000-1 §7.2.4: "%" starts a comment)
    const exact = Buffer.concat([samplePdf(), Buffer.alloc(maxBytes - samplePdf().length, 0x25)]);
    const res = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('files', exact, 'exact.pdf');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  });

  it('refuses more files than allowed at once with 413', async () => {
    const author = await person();
    const caseId = await caseBy(author);
    let req = request(app).post(`/api/cases/${caseId}/attachments`).set(as(author));
    for (let i = 0; i <= maxFiles; i++) req = req.attach('files', samplePdf(), `capture-${i}.pdf`);

    const res = await req;

    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({
      code: 'too_many_files',
      message: `At most ${maxFiles} files can be attached at once`,
    });
    expect(await rowsOf(caseId)).toEqual([]);
  });

  it('refuses a file in another form field with 400 naming the field, and an upload without files', async () => {
    const author = await person();
    const caseId = await caseBy(author);
    const wrong = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('photo', samplePdf(), 'a.pdf');
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.message).toBe('Send the files in the form field "files", not "photo"');
    const none = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .field('note', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.code).toBe('missing_file');
  });

  it('stores files under random names whatever path the upload names, and shows only the last segment', async () => {
    const author = await person();
    const caseId = await caseBy(author);

    const res = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('files', await samplePng(), { filename: '../../../../etc/cron.d/evil.png' })
      .attach('files', samplePdf(), { filename: '..\\..\\boot.ini.pdf' });

    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.attachments.map((a: { name: string }) => a.name)).toEqual([
      'evil.png',
      'boot.ini.pdf',
    ]);
    const rows = await rowsOf(caseId);
    for (const row of rows) {
      for (const key of [row.storage_key, row.thumbnail_key].filter(Boolean)) {
        expect(key).toMatch(/^[0-9a-f]{48}$/);
        expect(await storedFiles()).toContain(key);
      }
    }
    // nothing was written next to the storage directory
    expect(
      (await readdir(path.dirname(dir))).filter((n) => n === 'etc' || n === 'boot.ini.pdf'),
    ).toEqual([]);
    const served = await download(res.body.attachments[0].url);
    expect(served.headers['content-disposition']).toBe('inline; filename="evil.png"');
  });

  it('keeps a UTF-8 file name intact', async () => {
    const author = await person();
    const caseId = await caseBy(author);
    const res = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('files', await samplePng(), 'carte mère.png');
    expect(res.status).toBe(201);
    expect(res.body.attachments[0].name).toBe('carte mère.png');
    const served = await download(res.body.attachments[0].url);
    expect(served.headers['content-disposition']).toBe(
      `inline; filename="carte m_re.png"; filename*=UTF-8''carte%20m%C3%A8re.png`,
    );
  });
});

describe('who may attach, see and remove', () => {
  it('lets only the author or a moderator attach, refusing others before reading the upload', async () => {
    const author = await person();
    const other = await person();
    const moderator = await person('moderator');
    const caseId = await caseBy(author);
    const url = `/api/cases/${caseId}/attachments`;

    expect((await request(app).post(url).attach('files', samplePdf(), 'a.pdf')).status).toBe(401);
    const refused = await request(app).post(url).set(as(other)).attach('files', samplePdf(), 'a.pdf');
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toBe(
      `Only the author of case ${caseId} or a moderator can attach files to it`,
    );
    expect(
      (await request(app).post(url).set(as(moderator)).attach('files', samplePdf(), 'a.pdf')).status,
    ).toBe(201);
    expect(
      (
        await request(app)
          .post('/api/cases/2147483000/attachments')
          .set(as(author))
          .attach('files', samplePdf(), 'a.pdf')
      ).status,
    ).toBe(404);
  });

  it('lists a case attachments with their URLs, and hides a draft from everyone but its author and moderators', async () => {
    const author = await person();
    const stranger = await person();
    const moderator = await person('moderator');
    const draft = await caseBy(author, 'draft');
    await request(app)
      .post(`/api/cases/${draft}/attachments`)
      .set(as(author))
      .attach('files', await samplePng(), 'a.png')
      .expect(201);

    const mine = await request(app).get(`/api/cases/${draft}/attachments`).set(as(author));
    expect(mine.status).toBe(200);
    expect(mine.body.attachments).toEqual([
      expect.objectContaining({
        name: 'a.png',
        url: expect.stringMatching(/^\/api\/attachments\/\d+$/),
        thumbnailUrl: expect.stringMatching(/\/thumbnail$/),
      }),
    ]);
    expect(
      (await request(app).get(`/api/cases/${draft}/attachments`).set(as(moderator))).status,
    ).toBe(200);
    expect(
      (await request(app).get(`/api/cases/${draft}/attachments`).set(as(stranger))).status,
    ).toBe(404);
    expect((await request(app).get(`/api/cases/${draft}/attachments`)).status).toBe(404);
    expect((await request(app).get(mine.body.attachments[0].url)).status).toBe(404);
  });

  it('lets the uploader or a moderator remove an attachment, and removes its files', async () => {
    const author = await person();
    const other = await person();
    const moderator = await person('moderator');
    const caseId = await caseBy(author);
    const upload = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('files', await samplePng(), 'one.png')
      .attach('files', await samplePng(), 'two.png');
    const [one, two] = upload.body.attachments;
    const [rowOne] = await rowsOf(caseId);

    expect((await request(app).delete(one.url)).status).toBe(401);
    expect((await request(app).delete(one.url).set(as(other))).status).toBe(403);
    expect((await request(app).delete(one.url).set(as(author))).status).toBe(204);
    expect((await request(app).delete(two.url).set(as(moderator))).status).toBe(204);

    expect(await rowsOf(caseId)).toEqual([]);
    const files = await storedFiles();
    expect(files).not.toContain(rowOne.storage_key);
    expect(files).not.toContain(rowOne.thumbnail_key);
    expect((await request(app).get(one.url)).status).toBe(404);
    expect((await request(app).delete(one.url).set(as(author))).status).toBe(404);
  });

  it('answers 304 to a client that already has the file', async () => {
    const author = await person();
    const caseId = await caseBy(author);
    const upload = await request(app)
      .post(`/api/cases/${caseId}/attachments`)
      .set(as(author))
      .attach('files', await samplePng(), 'a.png');
    const first = await download(upload.body.attachments[0].url);
    const again = await request(app)
      .get(upload.body.attachments[0].url)
      .set('If-None-Match', first.headers.etag!);
    expect(again.status).toBe(304);
  });

  it('names no attachment with an id that is not a number', async () => {
    const res = await request(app).get('/api/attachments/..%2F..%2Fetc%2Fpasswd');
    expect(res.status).toBe(404);
  });
});

describe('attachment configuration', () => {
  it('defaults to 10 MiB per file, 8 files per upload and a directory under .railyard', () => {
    const env = readEnv({ DATABASE_URL: 'postgres://railyard@127.0.0.1:5432/x' });
    expect(env.ATTACHMENT_MAX_BYTES).toBe(10 * 1024 * 1024);
    expect(env.ATTACHMENT_MAX_FILES).toBe(8);
    expect(env.ATTACHMENTS_DIR).toBe(path.resolve(__dirname, '../../.railyard/attachments'));
  });
});
