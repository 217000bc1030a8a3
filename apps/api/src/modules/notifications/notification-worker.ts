// Sends what the outbox holds: each tick first bundles the daily digests that are due, then sends every
// due row. Delivery is at least once: a process that dies after the server took a mail but before the
// row was marked sends it again when the row's lease runs out.
import type { Logger } from '../../lib/logger';
import {
  defaultRetryPolicy,
  digestDayStart,
  retryDelayMs,
  type RetryPolicy,
} from './delivery-schedule';
import type { Mailer } from './mailer';
import { parseStoredMessage } from './notification-kinds';
import { renderNotification } from './notification-templates';
import type { ClaimedNotification, NotificationsRepository } from './notifications.repository';

export interface WorkerOptions {
  repo: NotificationsRepository;
  mailer: Mailer;
  logger: Logger;
  /** the address people open, for the links in the mails */
  baseUrl: string;
  maxAttempts: number;
  digestHourUtc: number;
  retry?: RetryPolicy;
  /** how long a claimed row is held while its mail is sent; longer than the mailer's timeouts */
  leaseMs?: number;
  /** rows claimed per round */
  batchSize?: number;
  clock?: () => Date;
}

export interface DeliveryCounts {
  sent: number;
  retried: number;
  failed: number;
  skipped: number;
}

interface SmtpError {
  message?: string;
  code?: string;
  responseCode?: number;
  permanent?: boolean;
}

/** Reasons not to send at all; the row is kept as skipped. */
function skipReason(row: ClaimedNotification): string | null {
  if (row.banned) return 'the account is banned';
  if (row.mode === 'off') return 'notifications are turned off';
  if (!row.email) return 'no verified e-mail address';
  return null;
}

function describe(err: unknown): string {
  const e = (err ?? {}) as SmtpError;
  const parts = [e.code, e.responseCode, e.message ?? String(err)].filter(
    (p) => p !== undefined && p !== '',
  );
  return parts.join(' ').slice(0, 1000);
}

export function createNotificationWorker(options: WorkerOptions) {
  const { repo, mailer, logger, baseUrl, maxAttempts, digestHourUtc } = options;
  const retry = options.retry ?? defaultRetryPolicy;
  const leaseMs = options.leaseMs ?? 5 * 60_000;
  const batchSize = options.batchSize ?? 50;
  const clock = options.clock ?? (() => new Date());

  async function deliver(row: ClaimedNotification, now: Date, counts: DeliveryCounts) {
    const skip = skipReason(row);
    if (skip) {
      await repo.markSkipped(row.id, skip);
      counts.skipped++;
      return;
    }
    let mail;
    try {
      mail = renderNotification(parseStoredMessage(row.kind, row.payload), {
        baseUrl,
        recipientName: row.recipientName,
      });
    } catch (err) {
      // a payload no template can read will not get better by waiting
      await repo.markFailed(row.id, describe(err));
      logger.error({ err, notification: row.id }, 'notification payload cannot be rendered');
      counts.failed++;
      return;
    }
    try {
      await mailer.send({ to: row.email!, ...mail });
      await repo.markSent(row.id, now);
      counts.sent++;
    } catch (err) {
      const error = describe(err);
      // nodemailer marks 5xx replies (except 503) as permanent: the same mail would be refused again
      if ((err as SmtpError).permanent === true || row.attempts >= maxAttempts) {
        await repo.markFailed(row.id, error);
        logger.warn(
          { notification: row.id, attempts: row.attempts, error },
          'notification failed for good',
        );
        counts.failed++;
      } else {
        await repo.markRetry(
          row.id,
          new Date(now.getTime() + retryDelayMs(row.attempts, retry)),
          error,
        );
        logger.info(
          { notification: row.id, attempts: row.attempts, error },
          'notification will be retried',
        );
        counts.retried++;
      }
    }
  }

  async function sendDue(now: Date, digestsOnly: boolean): Promise<DeliveryCounts> {
    const counts: DeliveryCounts = { sent: 0, retried: 0, failed: 0, skipped: 0 };
    // rounds until nothing is due; a row claimed here is not due again within this tick (its lease)
    for (;;) {
      const rows = await repo.claimDue({ now, limit: batchSize, leaseMs, digestsOnly });
      for (const row of rows) await deliver(row, now, counts);
      if (rows.length < batchSize) return counts;
    }
  }

  const worker = {
    /** Sends every due row (immediate notifications, digests, retries). */
    sendPending: (now: Date = clock()) => sendDue(now, false),

    /**
     * Bundles each daily-digest reader's waiting rows into one digest (at most one per digest day, which
     * starts at NOTIFY_DIGEST_HOUR_UTC) and sends the digests that are due.
     */
    async sendDailyDigests(now: Date = clock()): Promise<DeliveryCounts & { bundled: number }> {
      const dayStart = digestDayStart(now, digestHourUtc);
      let bundled = 0;
      for (const userId of await repo.usersDueForDigest(now, dayStart)) {
        if ((await repo.createDigest(userId, now, dayStart)) !== null) bundled++;
      }
      return { ...(await sendDue(now, true)), bundled };
    },

    async tick(now: Date = clock()) {
      const digests = await worker.sendDailyDigests(now);
      const pending = await worker.sendPending(now);
      return { digests, pending };
    },
  };

  let timer: NodeJS.Timeout | null = null;
  let running: Promise<unknown> | null = null;

  return {
    ...worker,

    /** Runs a tick every `intervalMs` (never two at once); the first one right away. */
    start(intervalMs: number) {
      if (timer) return;
      const run = () => {
        if (running) return;
        running = worker
          .tick()
          .catch((err: unknown) => logger.error({ err }, 'notification worker tick failed'))
          .finally(() => {
            running = null;
          });
      };
      timer = setInterval(run, intervalMs);
      timer.unref();
      run();
    },

    /** Stops the interval and waits for a tick in progress to finish. */
    async stop() {
      if (timer) clearInterval(timer);
      timer = null;
      await running;
    },
  };
}

export type NotificationWorker = ReturnType<typeof createNotificationWorker>;
