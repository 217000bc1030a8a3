import express from 'express';
import nodemailer from 'nodemailer';
import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { caughtMailSchema } from '@railyard/shared';
import { createMailer } from '../../modules/notifications/mailer';
import { createMailCatcher, type MailCatcher } from './mail-catcher';
import { mailboxRouter } from './mailbox.routes';

let catcher: MailCatcher | null = null;
afterEach(async () => {
  await catcher?.close();
  catcher = null;
});

async function started() {
  catcher = createMailCatcher();
  const port = await catcher.listen();
  return { catcher, port };
}

describe('mail catcher', () => {
  it('listens on a free loopback port', async () => {
    const { port } = await started();
    expect(port).toBeGreaterThan(0);
    expect(catcher!.port).toBe(port);
  });

  it('receives a message sent by nodemailer over SMTP and keeps its parts', async () => {
    const { port } = await started();
    const mailer = createMailer(
      { kind: 'catcher', port },
      'Railyard <notifications@railyard.invalid>',
    );

    await mailer.send({
      to: 'dana@example.com',
      subject: 'New comment on "VSYS short"',
      text: 'Rene commented.',
      html: '<p>Rene commented.</p>',
    });
    mailer.close();

    const [mail] = catcher!.messages();
    expect(mail).toMatchObject({
      from: 'notifications@railyard.invalid',
      to: ['dana@example.com'],
      envelopeTo: ['dana@example.com'],
      subject: 'New comment on "VSYS short"',
      text: 'Rene commented.',
      html: '<p>Rene commented.</p>',
    });
    expect(new Date(mail!.date!).getTime()).toBeGreaterThan(Date.now() - 60_000);
  });

  it('decodes non-ASCII subjects and bodies (RFC 2047 encoded words, quoted-printable)', async () => {
    const { port } = await started();
    const transport = nodemailer.createTransport({
      host: '127.0.0.1',
      port,
      secure: false,
      ignoreTLS: true,
    });
    await transport.sendMail({
      from: 'a@example.com',
      to: 'b@example.com',
      subject: 'Carte mère: court-circuit sur VCC_3V3',
      text: 'Lecture 0,002 V — fusible F1',
    });
    transport.close();
    const mail = await catcher!.waitFor((m) => m.to.includes('b@example.com'));
    expect(mail.subject).toBe('Carte mère: court-circuit sur VCC_3V3');
    expect(mail.text.trim()).toBe('Lecture 0,002 V — fusible F1');
  });

  it('keeps the newest messages only, up to its limit', async () => {
    catcher = createMailCatcher({ maxMessages: 2 });
    const port = await catcher.listen();
    const mailer = createMailer({ kind: 'catcher', port }, 'a@example.com');
    for (const n of [1, 2, 3])
      await mailer.send({ to: `t${n}@example.com`, subject: `m${n}`, text: 'x', html: '<p>x</p>' });
    mailer.close();
    expect(catcher.messages().map((m) => m.subject)).toEqual(['m2', 'm3']);
  });

  it('lets a sender see the failure when nothing listens on the port', async () => {
    const { port } = await started();
    await catcher!.close();
    const mailer = createMailer({ kind: 'catcher', port }, 'a@example.com');
    await expect(
      mailer.send({ to: 'b@example.com', subject: 's', text: 't', html: '<p>t</p>' }),
    ).rejects.toMatchObject({ code: 'ESOCKET' });
    mailer.close();
  });
});

describe('GET /dev/mailbox', () => {
  it('lists caught messages newest first, optionally for one recipient', async () => {
    const { port } = await started();
    const mailer = createMailer({ kind: 'catcher', port }, 'a@example.com');
    await mailer.send({
      to: 'dana@example.com',
      subject: 'first',
      text: 'one',
      html: '<p>one</p>',
    });
    await mailer.send({
      to: 'lee@example.com',
      subject: 'second',
      text: 'two',
      html: '<p>two</p>',
    });
    mailer.close();
    const app = express().use('/api', mailboxRouter(catcher!));

    const all = await request(app).get('/api/dev/mailbox');
    expect(all.status).toBe(200);
    expect(all.body.messages.map((m: { subject: string }) => m.subject)).toEqual([
      'second',
      'first',
    ]);
    expect(Object.keys(all.body.messages[0]).sort()).toEqual([
      'date',
      'envelopeTo',
      'from',
      'html',
      'id',
      'receivedAt',
      'subject',
      'text',
      'to',
    ]);
    // the shape the web client reads, from the shared contract
    expect(caughtMailSchema.array().safeParse(all.body.messages).success).toBe(true);

    const lee = await request(app).get('/api/dev/mailbox?to=LEE@example.com');
    expect(lee.body.messages.map((m: { subject: string }) => m.subject)).toEqual(['second']);
  });

  it('serves one message’s HTML part with a policy that allows its inline styles and nothing else', async () => {
    const { port } = await started();
    const mailer = createMailer({ kind: 'catcher', port }, 'a@example.com');
    await mailer.send({ to: 'dana@example.com', subject: 's', text: 't', html: '<p style="color:#063">styled</p>' });
    mailer.close();
    const app = express().use('/api', mailboxRouter(catcher!));
    const [mail] = (await request(app).get('/api/dev/mailbox')).body.messages as { id: number }[];

    const page = await request(app).get(`/api/dev/mailbox/${mail!.id}/html`);
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toMatch(/^text\/html/);
    expect(page.text).toContain('<p style="color:#063">styled</p>');
    // CSP Level 3 directives: no default sources, inline styles only, framed by this site only, sandboxed
    const policy = String(page.headers['content-security-policy']).split(';').map((d) => d.trim());
    expect(policy).toEqual(expect.arrayContaining(["default-src 'none'", "style-src 'unsafe-inline'", "frame-ancestors 'self'", 'sandbox']));
    expect(policy.some((d) => d.startsWith('script-src'))).toBe(false);
    expect((await request(app).get('/api/dev/mailbox/999999/html')).status).toBe(404);
  });
});
