// A local SMTP server that keeps every message it receives in memory instead of delivering it, so
// development and tests can read the mail Railyard sends. Plain SMTP on 127.0.0.1 only: no TLS, no
// authentication, any sender and recipient.
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { CaughtMail } from '@railyard/shared';

export interface MailCatcherOptions {
  /** 0 (the default) picks a free port */
  port?: number;
  /** oldest messages are dropped beyond this many */
  maxMessages?: number;
  /** larger messages are refused with 552 */
  maxBytes?: number;
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '').filter(Boolean));
}

export function createMailCatcher(options: MailCatcherOptions = {}) {
  const maxMessages = options.maxMessages ?? 500;
  const messages: CaughtMail[] = [];
  const waiters = new Set<{ test: (m: CaughtMail) => boolean; resolve: (m: CaughtMail) => void }>();
  let nextId = 1;
  let port: number | null = null;

  const server = new SMTPServer({
    // no STARTTLS, so smtp-server never uses its built-in test certificate
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    disableReverseLookup: true,
    logger: false,
    size: options.maxBytes ?? 25 * 1024 * 1024,
    rejectOversized: true,
    onData(stream, session, callback) {
      simpleParser(stream).then(
        (parsed) => {
          const mail: CaughtMail = {
            id: nextId++,
            from:
              addresses(parsed.from)[0] ??
              (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            to: [...addresses(parsed.to), ...addresses(parsed.cc)],
            envelopeTo: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            date: parsed.date?.toISOString() ?? null,
            receivedAt: new Date().toISOString(),
          };
          messages.push(mail);
          if (messages.length > maxMessages) messages.splice(0, messages.length - maxMessages);
          for (const waiter of waiters) {
            if (waiter.test(mail)) {
              waiters.delete(waiter);
              waiter.resolve(mail);
            }
          }
          callback();
        },
        (err: Error) => callback(err),
      );
    },
  });

  return {
    /** the port it listens on, once started */
    get port() {
      return port;
    },

    async listen(): Promise<number> {
      if (port !== null) return port;
      await new Promise<void>((resolve, reject) => {
        server.server.once('error', reject);
        server.listen(options.port ?? 0, '127.0.0.1', () => {
          server.server.off('error', reject);
          resolve();
        });
      });
      port = (server.server.address() as AddressInfo).port;
      return port;
    },

    /** Caught messages, oldest first. */
    messages: (): readonly CaughtMail[] => [...messages],

    clear() {
      messages.length = 0;
    },

    /** The first message (already caught or still to come) that passes `test`. */
    waitFor(test: (m: CaughtMail) => boolean, timeoutMs = 5000): Promise<CaughtMail> {
      const found = messages.find(test);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const waiter = { test, resolve: (m: CaughtMail) => (clearTimeout(timer), resolve(m)) };
        const timer = setTimeout(() => {
          waiters.delete(waiter);
          reject(
            new Error(
              `no matching mail arrived within ${timeoutMs} ms (${messages.length} caught)`,
            ),
          );
        }, timeoutMs);
        waiters.add(waiter);
      });
    },

    async close(): Promise<void> {
      if (port === null) return;
      port = null;
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

export type MailCatcher = ReturnType<typeof createMailCatcher>;
