// E-mail notifications against the real database and real SMTP on loopback: the outbox written in the
// action's transaction, the worker (driven by an injected clock), retries, preferences and digests.
import { randomBytes, randomInt } from 'node:crypto';
import { createServer, type AddressInfo } from 'node:net';
import express, { type RequestHandler } from 'express';
import pg from 'pg';
import { SMTPServer } from 'smtp-server';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { UserRole } from '@railyard/shared';
import { readEnv } from '../../apps/api/src/config/env';
import { createDatabase, type Database } from '../../apps/api/src/db/client';
import {
  createMailCatcher,
  type MailCatcher,
} from '../../apps/api/src/dev/mail-catcher/mail-catcher';
import { createLogger } from '../../apps/api/src/lib/logger';
import { errorHandler } from '../../apps/api/src/middleware/error-handler';
import { createMailer } from '../../apps/api/src/modules/notifications/mailer';
import { createNotificationDelivery } from '../../apps/api/src/modules/notifications/notification-delivery';
import { createNotificationWorker } from '../../apps/api/src/modules/notifications/notification-worker';
import {
  createNotificationsRepository,
  enqueueModeratorNotification,
  enqueueNotification,
} from '../../apps/api/src/modules/notifications/notifications.repository';
import { notificationsRouter } from '../../apps/api/src/modules/notifications/notifications.routes';
import { createNotificationsService } from '../../apps/api/src/modules/notifications/notifications.service';

const logger = createLogger('silent');
const minute = 60_000;
let pool: pg.Pool;
let db: Database;
let catcher: MailCatcher;
const repo = () => createNotificationsRepository(db);

beforeAll(async () => {
  pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 4 });
  db = createDatabase(pool);
  catcher = createMailCatcher();
  await catcher.listen();
});
afterAll(async () => {
  await catcher.close();
  await pool.end();
});

interface Person {
  id: number;
  email: string | null;
  login: string;
}

async function person(
  options: { role?: UserRole; email?: string | null; banned?: boolean } = {},
): Promise<Person> {
  const login = `tech-${randomBytes(4).toString('hex')}`;
  const email = options.email === undefined ? `${login}@example.com` : options.email;
  const { rows } = await pool.query<{ id: number }>(
    'INSERT INTO users (github_id, login, name, role, email, banned_at) VALUES ($1, $2, $3, $4, $5, $6) RETURNING id',
    [
      randomInt(100_000_000, 2_000_000_000),
      login,
      `Tech ${login.slice(5)}`,
      options.role ?? 'member',
      email,
      options.banned ? new Date() : null,
    ],
  );
  return { id: rows[0]!.id, email, login };
}

const comment = (caseId = 7) => ({
  kind: 'case_commented',
  payload: {
    caseId,
    caseTitle: 'Dead board, VSYS at 0.003 V',
    commentId: 41,
    commenterName: 'Rene',
    excerpt: 'Lift L3 and measure again.',
  },
});

async function outboxOf(userId: number) {
  const { rows } = await pool.query(
    'SELECT id, kind, status, attempts, next_attempt_at, last_error, sent_at, digest_id FROM notification_outbox WHERE user_id = $1 ORDER BY id',
    [userId],
  );
  return rows;
}

function workerWith(
  mailer = createMailer(
    { kind: 'catcher', port: catcher.port! },
    'Railyard <notifications@railyard.invalid>',
  ),
) {
  return createNotificationWorker({
    repo: repo(),
    mailer,
    logger,
    baseUrl: 'https://railyard.example',
    maxAttempts: 3,
    digestHourUtc: 7,
    retry: { baseDelayMs: minute, maxDelayMs: 60 * minute },
  });
}

/** A moment safely after every row's database-clock timestamps, for the injected clock. */
const soon = () => new Date(Date.now() + 5_000);

async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  const { port } = server.address() as AddressInfo;
  await new Promise((r) => server.close(r));
  return port;
}

describe('enqueueNotification', () => {
  it('writes the outbox row in the caller transaction, so it rolls back with the action', async () => {
    const author = await person();
    await expect(
      db.transaction(async (tx) => {
        await enqueueNotification(tx, { userId: author.id, ...comment() });
        throw new Error('the comment could not be saved');
      }),
    ).rejects.toThrow('the comment could not be saved');
    expect(await outboxOf(author.id)).toEqual([]);

    const id = await db.transaction((tx) =>
      enqueueNotification(tx, { userId: author.id, ...comment() }),
    );

    expect(await outboxOf(author.id)).toEqual([
      expect.objectContaining({ id, kind: 'case_commented', status: 'pending', attempts: 0 }),
    ]);
  });

  it('refuses a payload that does not fit its kind, naming the field', async () => {
    const author = await person();
    await expect(
      db.transaction((tx) =>
        enqueueNotification(tx, {
          userId: author.id,
          kind: 'case_commented',
          payload: { caseId: 'seven', caseTitle: 'x' },
        }),
      ),
    ).rejects.toThrow(/Invalid case_commented notification payload: caseId: .*; commentId/);
    await expect(
      db.transaction((tx) =>
        enqueueNotification(tx, { userId: author.id, kind: 'case_liked', payload: {} }),
      ),
    ).rejects.toThrow(/Unknown notification kind "case_liked"/);
  });

  it('queues flagged content for every moderator and admin, not for members, banned people or the flagger', async () => {
    const flagger = await person({ role: 'moderator' });
    const moderator = await person({ role: 'moderator' });
    const admin = await person({ role: 'admin' });
    const member = await person();
    const bannedModerator = await person({ role: 'moderator', banned: true });

    const count = await db.transaction((tx) =>
      enqueueModeratorNotification(tx, {
        kind: 'content_flagged',
        payload: {
          caseId: 3,
          caseTitle: 'Spam case',
          target: 'case',
          flaggedByName: 'Kim',
          reason: 'advertising',
        },
        exceptUserId: flagger.id,
      }),
    );

    expect(count).toBeGreaterThanOrEqual(2);
    expect(await outboxOf(moderator.id)).toHaveLength(1);
    expect(await outboxOf(admin.id)).toHaveLength(1);
    for (const nobody of [flagger, member, bannedModerator])
      expect(await outboxOf(nobody.id)).toEqual([]);
  });
});

describe('the notification worker', () => {
  it('sends pending rows over SMTP and marks them sent', async () => {
    const author = await person();
    await db.transaction((tx) => enqueueNotification(tx, { userId: author.id, ...comment(12) }));
    const now = soon();

    const counts = await workerWith().sendPending(now);

    expect(counts.sent).toBeGreaterThanOrEqual(1);
    const mail = await catcher.waitFor((m) => m.envelopeTo.includes(author.email!));
    expect(mail.subject).toBe('New comment on "Dead board, VSYS at 0.003 V"');
    expect(mail.text).toContain('Read the comment: https://railyard.example/cases/12#comment-41');
    expect(mail.html).toContain('<a href="https://railyard.example/cases/12#comment-41">');
    expect(await outboxOf(author.id)).toEqual([
      expect.objectContaining({ status: 'sent', attempts: 1, sent_at: now, last_error: null }),
    ]);
  });

  it('retries with a doubling wait when the mail server cannot be reached, and keeps the row when it gives up', async () => {
    const author = await person();
    await db.transaction((tx) => enqueueNotification(tx, { userId: author.id, ...comment() }));
    const worker = workerWith(
      createMailer({ kind: 'catcher', port: await closedPort() }, 'a@example.com'),
    );
    const t0 = soon();

    await worker.sendPending(t0);
    let [row] = await outboxOf(author.id);
    expect(row).toMatchObject({
      status: 'pending',
      attempts: 1,
      next_attempt_at: new Date(t0.getTime() + minute),
    });
    expect(row.last_error).toMatch(/ECONNREFUSED|ESOCKET/);

    // not due yet: nothing happens
    await worker.sendPending(new Date(t0.getTime() + 30_000));
    expect((await outboxOf(author.id))[0].attempts).toBe(1);

    const t1 = new Date(t0.getTime() + minute);
    await worker.sendPending(t1);
    [row] = await outboxOf(author.id);
    expect(row).toMatchObject({
      status: 'pending',
      attempts: 2,
      next_attempt_at: new Date(t1.getTime() + 2 * minute),
    });

    await worker.sendPending(new Date(t1.getTime() + 2 * minute));
    expect(await outboxOf(author.id)).toEqual([
      expect.objectContaining({ status: 'failed', attempts: 3, sent_at: null }),
    ]);
  });

  it('gives up at once when the server refuses the recipient for good (5xx)', async () => {
    // RFC 5321 §4.2.1: a 5yz reply is a permanent negative completion
    const refusing = new SMTPServer({
      disabledCommands: ['STARTTLS', 'AUTH'],
      authOptional: true,
      logger: false,
      onRcptTo(_address, _session, callback) {
        callback(Object.assign(new Error('No such mailbox'), { responseCode: 550 }));
      },
    });
    await new Promise<void>((r) => refusing.listen(0, '127.0.0.1', () => r()));
    try {
      const author = await person();
      await db.transaction((tx) => enqueueNotification(tx, { userId: author.id, ...comment() }));
      await workerWith(
        createMailer(
          { kind: 'catcher', port: (refusing.server.address() as AddressInfo).port },
          'a@example.com',
        ),
      ).sendPending(soon());
      const [row] = await outboxOf(author.id);
      expect(row).toMatchObject({ status: 'failed', attempts: 1 });
      expect(row.last_error).toContain('550');
    } finally {
      await new Promise<void>((r) => refusing.close(() => r()));
    }
  });

  it('sends nothing to someone who turned notifications off, nor to someone without a verified address or banned', async () => {
    const quiet = await person();
    const noAddress = await person({ email: null });
    const banned = await person({ banned: true });
    await repo().setMode(quiet.id, 'off', new Date());
    for (const p of [quiet, noAddress, banned])
      await db.transaction((tx) => enqueueNotification(tx, { userId: p.id, ...comment() }));

    await workerWith().sendPending(soon());

    expect(
      catcher
        .messages()
        .filter((m) => m.envelopeTo.includes(quiet.email!) || m.envelopeTo.includes(banned.email!)),
    ).toEqual([]);
    expect((await outboxOf(quiet.id))[0]).toMatchObject({
      status: 'skipped',
      last_error: 'notifications are turned off',
      sent_at: null,
    });
    expect((await outboxOf(noAddress.id))[0]).toMatchObject({
      status: 'skipped',
      last_error: 'no verified e-mail address',
    });
    expect((await outboxOf(banned.id))[0]).toMatchObject({
      status: 'skipped',
      last_error: 'the account is banned',
    });
  });

  it('holds a claimed row for the lease, then sends it again if the process died mid-send', async () => {
    const author = await person();
    await db.transaction((tx) => enqueueNotification(tx, { userId: author.id, ...comment() }));
    const t0 = soon();
    // a process claims the row and dies before marking it
    const claimed = await repo().claimDue({
      now: t0,
      limit: 1000,
      leaseMs: 5 * minute,
      digestsOnly: false,
    });
    expect(claimed.map((c) => c.userId)).toContain(author.id);

    await workerWith().sendPending(new Date(t0.getTime() + 4 * minute));
    expect((await outboxOf(author.id))[0]).toMatchObject({ status: 'pending', attempts: 1 });

    await workerWith().sendPending(new Date(t0.getTime() + 5 * minute));
    expect((await outboxOf(author.id))[0]).toMatchObject({ status: 'sent', attempts: 2 });
  });

  it('runs on an interval once started and stops cleanly', async () => {
    const author = await person();
    const worker = workerWith();
    worker.start(50);
    try {
      await db.transaction((tx) => enqueueNotification(tx, { userId: author.id, ...comment() }));
      await catcher.waitFor((m) => m.envelopeTo.includes(author.email!), 5000);
    } finally {
      await worker.stop();
    }
    await expect.poll(async () => (await outboxOf(author.id))[0].status).toBe('sent');
  });
});

describe('daily digests', () => {
  /** 08:00 UTC, `days` days after today: past the 07:00 digest hour, and after every row's created_at. */
  function morning(days: number, hour = 8): Date {
    const d = new Date();
    return new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate() + days, hour));
  }

  it('bundles a reader rows into one mail a day, and leaves later rows for the next day', async () => {
    const reader = await person();
    await repo().setMode(reader.id, 'daily_digest', new Date());
    for (const caseId of [21, 22, 23])
      await db.transaction((tx) =>
        enqueueNotification(tx, { userId: reader.id, ...comment(caseId) }),
      );
    const worker = workerWith();

    // the immediate round leaves digest readers alone
    await worker.sendPending(soon());
    expect((await outboxOf(reader.id)).map((r) => [r.status, r.attempts])).toEqual([
      ['pending', 0],
      ['pending', 0],
      ['pending', 0],
    ]);

    const first = await worker.sendDailyDigests(morning(1));
    expect(first.bundled).toBeGreaterThanOrEqual(1);
    const digests = () => catcher.messages().filter((m) => m.envelopeTo.includes(reader.email!));
    expect(digests()).toHaveLength(1);
    expect(digests()[0]!.subject).toBe('Railyard: 3 updates on your cases');
    for (const caseId of [21, 22, 23])
      expect(digests()[0]!.text).toContain(`https://railyard.example/cases/${caseId}#comment-41`);
    const rows = await outboxOf(reader.id);
    const digest = rows.find((r) => r.kind === 'digest')!;
    expect(digest).toMatchObject({ status: 'sent', sent_at: morning(1) });
    expect(rows.filter((r) => r.kind !== 'digest')).toEqual(
      Array.from({ length: 3 }, () =>
        expect.objectContaining({ status: 'sent', digest_id: digest.id, sent_at: morning(1) }),
      ),
    );

    // a row later the same day waits for tomorrow's digest
    await db.transaction((tx) => enqueueNotification(tx, { userId: reader.id, ...comment(24) }));
    await worker.sendDailyDigests(morning(1, 20));
    expect(digests()).toHaveLength(1);

    await worker.sendDailyDigests(morning(2));
    expect(digests().map((m) => m.subject)).toEqual([
      'Railyard: 3 updates on your cases',
      'Railyard: 1 update on your cases',
    ]);
  });

  it('sends nothing to a reader with nothing new', async () => {
    const reader = await person();
    await repo().setMode(reader.id, 'daily_digest', new Date());
    await workerWith().sendDailyDigests(morning(1));
    expect(await outboxOf(reader.id)).toEqual([]);
  });
});

describe('GET and PUT /api/me/notifications', () => {
  const users = new Map<number, Express.User>();
  const signedIn: RequestHandler = (req, _res, next) => {
    const id = Number(req.get('x-test-user'));
    if (users.has(id)) req.user = users.get(id);
    next();
  };
  const pass: RequestHandler = (_req, _res, next) => next();
  let app: express.Express;
  beforeAll(() => {
    app = express().use(signedIn, express.json());
    app.use('/api', notificationsRouter(createNotificationsService({ repo: repo() }), pass));
    app.use(errorHandler(logger));
  });
  async function signedInPerson() {
    const p = await person();
    users.set(p.id, {
      id: p.id,
      login: p.login,
      name: '',
      avatarUrl: '',
      role: 'member',
      banned: false,
    });
    return { 'X-Test-User': String(p.id), email: p.email };
  }

  it('answers the default mode and the address mails go to, then keeps a new choice', async () => {
    const { email, ...headers } = await signedInPerson();
    expect((await request(app).get('/api/me/notifications').set(headers)).body).toEqual({
      mode: 'immediate',
      email,
    });

    const put = await request(app)
      .put('/api/me/notifications')
      .set(headers)
      .send({ mode: 'daily_digest' });

    expect(put.status).toBe(200);
    expect(put.body).toEqual({ mode: 'daily_digest', email });
    expect((await request(app).get('/api/me/notifications').set(headers)).body.mode).toBe(
      'daily_digest',
    );
  });

  it('refuses an unknown mode naming the field, a non-JSON body, and anyone not signed in', async () => {
    const { email: _email, ...headers } = await signedInPerson();
    const bad = await request(app)
      .put('/api/me/notifications')
      .set(headers)
      .send({ mode: 'weekly' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.issues[0].field).toBe('mode');
    expect(
      (await request(app).put('/api/me/notifications').set(headers).type('form').send('mode=off'))
        .status,
    ).toBe(415);
    expect((await request(app).get('/api/me/notifications')).status).toBe(401);
    expect((await request(app).put('/api/me/notifications').send({ mode: 'off' })).status).toBe(
      401,
    );
  });
});

describe('notification delivery from the configuration', () => {
  it('uses the local mail catcher outside production when no SMTP_URL is set', async () => {
    const env = readEnv({
      DATABASE_URL: process.env.DATABASE_URL,
      NODE_ENV: 'test',
      NOTIFY_INTERVAL_SECONDS: '0',
    });
    const delivery = createNotificationDelivery({ env, db, logger });
    try {
      await delivery.start();
      expect(delivery.catcher!.port).toBeGreaterThan(0);
      const author = await person();
      await db.transaction((tx) => enqueueNotification(tx, { userId: author.id, ...comment() }));
      await delivery.worker!.tick(soon());
      expect(delivery.catcher!.messages().some((m) => m.envelopeTo.includes(author.email!))).toBe(
        true,
      );
    } finally {
      await delivery.stop();
    }
    expect(delivery.catcher!.port).toBeNull();
  });

  it('starts no catcher and no worker in production without SMTP_URL', async () => {
    const env = readEnv({
      DATABASE_URL: process.env.DATABASE_URL,
      NODE_ENV: 'production',
      GITHUB_CLIENT_ID: 'id',
      GITHUB_CLIENT_SECRET: 'secret',
      SESSION_SECRET: 'a'.repeat(48),
      PUBLIC_URL: 'https://railyard.example',
    });
    const delivery = createNotificationDelivery({ env, db, logger });
    await delivery.start();
    expect(delivery.catcher).toBeNull();
    expect(delivery.worker).toBeNull();
    await delivery.stop();
  });

  it('refuses production mail settings without a sender, and an SMTP_URL that is not SMTP', () => {
    const production = {
      DATABASE_URL: process.env.DATABASE_URL,
      NODE_ENV: 'production',
      GITHUB_CLIENT_ID: 'id',
      GITHUB_CLIENT_SECRET: 'secret',
      SESSION_SECRET: 'a'.repeat(48),
      PUBLIC_URL: 'https://railyard.example',
    };
    expect(() => readEnv({ ...production, SMTP_URL: 'smtp://mail.example:587' })).toThrow(
      /MAIL_FROM: production sending mail \(SMTP_URL\) needs MAIL_FROM/,
    );
    expect(() => readEnv({ ...production, SMTP_URL: 'https://mail.example' })).toThrow(
      /SMTP_URL must be an smtp:\/\/ or smtps:\/\/ URL/,
    );
    expect(() =>
      readEnv({
        ...production,
        SMTP_URL: 'smtps://u:p@mail.example:465',
        MAIL_FROM: 'Railyard <n@railyard.example>',
      }),
    ).not.toThrow();
  });
});
