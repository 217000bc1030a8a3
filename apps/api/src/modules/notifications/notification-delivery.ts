// Puts the sending side together from the configuration: the mail server (SMTP_URL, or outside
// production the local mail catcher), the mailer and the worker with its interval. The API process
// calls start() once it is up and stop() on shutdown.
import { mailDelivery, type Env } from '../../config/env';
import type { Database } from '../../db/client';
import { createMailCatcher, type MailCatcher } from '../../dev/mail-catcher/mail-catcher';
import type { Logger } from '../../lib/logger';
import { createMailer, defaultMailFrom, type Mailer, type MailServer } from './mailer';
import { createNotificationWorker, type NotificationWorker } from './notification-worker';
import { createNotificationsRepository } from './notifications.repository';

export interface NotificationDelivery {
  /** the local mail catcher, when mail goes there (outside production without SMTP_URL); mount its mailbox */
  readonly catcher: MailCatcher | null;
  /** the worker once start() has run (null in production without SMTP_URL) */
  readonly worker: NotificationWorker | null;
  start(): Promise<void>;
  stop(): Promise<void>;
}

export function createNotificationDelivery(deps: {
  env: Env;
  db: Database;
  logger: Logger;
}): NotificationDelivery {
  const { env, db, logger } = deps;
  const mode = mailDelivery(env);
  const catcher = mode === 'catcher' ? createMailCatcher({ port: env.MAIL_CATCHER_PORT }) : null;
  const repo = createNotificationsRepository(db);
  const baseUrl = env.PUBLIC_URL ?? `http://${env.HOST}:${env.PORT}`;
  let mailer: Mailer | null = null;
  let worker: NotificationWorker | null = null;
  let starting: Promise<void> | null = null;
  let stopped = false;

  async function begin() {
    if (mode === 'none') {
      logger.warn(
        'SMTP_URL is not set: notification e-mails wait in the outbox until a mail server is configured',
      );
      return;
    }
    let server: MailServer;
    if (catcher) {
      const port = await catcher.listen();
      logger.info(
        { port },
        'mail catcher listening on 127.0.0.1 (development mail, read it at /api/dev/mailbox)',
      );
      server = { kind: 'catcher', port };
    } else {
      server = { kind: 'smtp', url: env.SMTP_URL! };
    }
    if (stopped) return;
    mailer = createMailer(server, env.MAIL_FROM ?? defaultMailFrom);
    worker = createNotificationWorker({
      repo,
      mailer,
      logger,
      baseUrl,
      maxAttempts: env.NOTIFY_MAX_ATTEMPTS,
      digestHourUtc: env.NOTIFY_DIGEST_HOUR_UTC,
    });
    if (env.NOTIFY_INTERVAL_SECONDS > 0) worker.start(env.NOTIFY_INTERVAL_SECONDS * 1000);
  }

  return {
    catcher,
    get worker() {
      return worker;
    },
    start() {
      starting ??= begin();
      return starting;
    },
    async stop() {
      stopped = true;
      await starting?.catch(() => undefined);
      await worker?.stop();
      mailer?.close();
      await catcher?.close();
    },
  };
}
