// The notification outbox and preferences. Rows are claimed with FOR UPDATE SKIP LOCKED and a lease
// (next_attempt_at pushed ahead while a mail is on its way), so several API processes can run the
// worker at once and a process that dies mid-send only delays its rows until the lease runs out.
import { and, eq, inArray, isNull, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { notificationOutbox, notificationPreferences } from '../../db/schema/notifications';
import { users } from '../../db/schema/users';
import {
  defaultNotificationMode,
  parseNotificationEvent,
  type NotificationKind,
  type NotificationMode,
} from './notification-kinds';

/** The database or an open transaction: the outbox row commits (or rolls back) with the action. */
type Writer = Pick<Database, 'insert' | 'select'>;

export interface EnqueueInput {
  userId: number;
  kind: string;
  payload: unknown;
}

/**
 * Queues one e-mail notification for one person, in the caller's transaction. The payload is checked
 * against its kind's schema here, so a malformed one throws and takes the action down with it.
 * Whether and how the person gets it (off, at once, in the daily digest) is decided when it is sent.
 */
export async function enqueueNotification(tx: Writer, input: EnqueueInput): Promise<number> {
  const event = parseNotificationEvent(input.kind, input.payload);
  const [row] = await tx
    .insert(notificationOutbox)
    .values({ userId: input.userId, kind: event.kind, payload: event.payload })
    .returning({ id: notificationOutbox.id });
  return row!.id;
}

/**
 * Queues a notification for every moderator and admin who is not banned (content_flagged), leaving out
 * `exceptUserId` (a moderator who flagged something needs no mail about it). Returns how many rows.
 */
export async function enqueueModeratorNotification(
  tx: Writer,
  input: { kind: string; payload: unknown; exceptUserId?: number },
): Promise<number> {
  const event = parseNotificationEvent(input.kind, input.payload);
  const moderators = await tx
    .select({ id: users.id })
    .from(users)
    .where(and(inArray(users.role, ['moderator', 'admin']), isNull(users.bannedAt)));
  const recipients = moderators.map((m) => m.id).filter((id) => id !== input.exceptUserId);
  if (recipients.length === 0) return 0;
  await tx
    .insert(notificationOutbox)
    .values(recipients.map((userId) => ({ userId, kind: event.kind, payload: event.payload })));
  return recipients.length;
}

export interface ClaimedNotification {
  id: number;
  userId: number;
  kind: NotificationKind;
  payload: unknown;
  attempts: number;
  email: string | null;
  recipientName: string;
  banned: boolean;
  mode: NotificationMode;
}

type ClaimedRow = {
  id: number;
  user_id: number;
  kind: NotificationKind;
  payload: unknown;
  attempts: number;
  email: string | null;
  name: string;
  login: string;
  banned_at: Date | null;
  mode: NotificationMode | null;
};

export function createNotificationsRepository(db: Database) {
  /** Marks a row and, for a digest, the rows it carries. */
  async function settle(id: number, change: Partial<typeof notificationOutbox.$inferInsert>) {
    await db.transaction(async (tx) => {
      await tx.update(notificationOutbox).set(change).where(eq(notificationOutbox.id, id));
      if (change.status && change.status !== 'pending') {
        const { status, sentAt, lastError } = change;
        await tx
          .update(notificationOutbox)
          .set({ status, sentAt, lastError })
          .where(eq(notificationOutbox.digestId, id));
      }
    });
  }

  return {
    async getMode(userId: number): Promise<NotificationMode | null> {
      const rows = await db
        .select({ mode: notificationPreferences.mode })
        .from(notificationPreferences)
        .where(eq(notificationPreferences.userId, userId));
      return rows[0]?.mode ?? null;
    },

    async setMode(userId: number, mode: NotificationMode, now: Date): Promise<void> {
      await db
        .insert(notificationPreferences)
        .values({ userId, mode, updatedAt: now })
        .onConflictDoUpdate({
          target: notificationPreferences.userId,
          set: { mode, updatedAt: now },
        });
    },

    async findUserEmail(userId: number): Promise<{ email: string | null } | null> {
      const rows = await db.select({ email: users.email }).from(users).where(eq(users.id, userId));
      return rows[0] ?? null;
    },

    /**
     * Claims up to `limit` rows that are due: pending, not carried by a digest, and either a digest or
     * for someone who is not on the daily digest. Each claim counts as an attempt and holds the row for
     * `leaseMs`.
     */
    async claimDue(options: {
      now: Date;
      limit: number;
      leaseMs: number;
      digestsOnly: boolean;
    }): Promise<ClaimedNotification[]> {
      const { now, limit, leaseMs, digestsOnly } = options;
      const leaseUntil = new Date(now.getTime() + leaseMs);
      const result = await db.execute<ClaimedRow>(sql`
        WITH due AS (
          SELECT o.id
          FROM notification_outbox o
          LEFT JOIN notification_preferences p ON p.user_id = o.user_id
          WHERE o.status = 'pending'
            AND o.digest_id IS NULL
            AND o.next_attempt_at <= ${now}
            AND ${digestsOnly ? sql`o.kind = 'digest'` : sql`(o.kind = 'digest' OR coalesce(p.mode, ${defaultNotificationMode}) <> 'daily_digest')`}
          ORDER BY o.next_attempt_at, o.id
          LIMIT ${limit}
          FOR UPDATE OF o SKIP LOCKED
        ), claimed AS (
          UPDATE notification_outbox o
          SET attempts = o.attempts + 1, next_attempt_at = ${leaseUntil}
          FROM due WHERE o.id = due.id
          RETURNING o.id, o.user_id, o.kind, o.payload, o.attempts
        )
        SELECT c.id, c.user_id, c.kind, c.payload, c.attempts, u.email, u.name, u.login, u.banned_at, p.mode
        FROM claimed c
        JOIN users u ON u.id = c.user_id
        LEFT JOIN notification_preferences p ON p.user_id = c.user_id
        ORDER BY c.id`);
      return result.rows.map((r) => ({
        id: r.id,
        userId: r.user_id,
        kind: r.kind,
        payload: r.payload,
        attempts: r.attempts,
        email: r.email,
        recipientName: r.name || r.login,
        banned: r.banned_at !== null,
        mode: r.mode ?? defaultNotificationMode,
      }));
    },

    markSent: (id: number, now: Date) =>
      settle(id, { status: 'sent', sentAt: now, lastError: null }),
    markSkipped: (id: number, reason: string) =>
      settle(id, { status: 'skipped', lastError: reason }),
    markFailed: (id: number, error: string) => settle(id, { status: 'failed', lastError: error }),
    markRetry: (id: number, nextAttemptAt: Date, error: string) =>
      settle(id, { nextAttemptAt, lastError: error }),

    /** People on the daily digest with rows waiting and no digest yet in the day starting at `dayStart`. */
    async usersDueForDigest(now: Date, dayStart: Date): Promise<number[]> {
      const result = await db.execute<{ user_id: number }>(sql`
        SELECT DISTINCT o.user_id
        FROM notification_outbox o
        JOIN notification_preferences p ON p.user_id = o.user_id AND p.mode = 'daily_digest'
        WHERE o.status = 'pending' AND o.digest_id IS NULL AND o.kind <> 'digest' AND o.created_at <= ${now}
          AND NOT EXISTS (
            SELECT 1 FROM notification_outbox d
            WHERE d.user_id = o.user_id AND d.kind = 'digest' AND d.created_at >= ${dayStart})
        ORDER BY o.user_id`);
      return result.rows.map((r) => r.user_id);
    },

    /**
     * Bundles a person's waiting rows into one digest row, due at once. An advisory lock per person and a
     * second look for today's digest inside the transaction keep two processes from making two.
     * Returns the digest's id, or null when there was nothing (left) to bundle.
     */
    async createDigest(userId: number, now: Date, dayStart: Date): Promise<number | null> {
      return db.transaction(async (tx) => {
        await tx.execute(
          sql`SELECT pg_advisory_xact_lock(hashtext('notification-digest'), ${userId})`,
        );
        const already = await tx.execute(sql`
          SELECT 1 FROM notification_outbox WHERE user_id = ${userId} AND kind = 'digest' AND created_at >= ${dayStart} LIMIT 1`);
        if (already.rows.length > 0) return null;
        const rows = await tx.execute<{
          id: number;
          kind: NotificationKind;
          payload: unknown;
          created_at: Date;
        }>(sql`
          SELECT id, kind, payload, created_at FROM notification_outbox
          WHERE user_id = ${userId} AND status = 'pending' AND digest_id IS NULL AND kind <> 'digest' AND created_at <= ${now}
          ORDER BY created_at, id
          FOR UPDATE SKIP LOCKED`);
        if (rows.rows.length === 0) return null;
        const items = rows.rows.map((r) => ({
          id: r.id,
          kind: r.kind,
          createdAt: new Date(r.created_at).toISOString(),
          payload: r.payload,
        }));
        const [digest] = await tx
          .insert(notificationOutbox)
          .values({
            userId,
            kind: 'digest',
            payload: { day: dayStart.toISOString(), items },
            nextAttemptAt: now,
            createdAt: now,
          })
          .returning({ id: notificationOutbox.id });
        await tx
          .update(notificationOutbox)
          .set({ digestId: digest!.id })
          .where(
            inArray(
              notificationOutbox.id,
              items.map((i) => i.id),
            ),
          );
        return digest!.id;
      });
    },
  };
}

export type NotificationsRepository = ReturnType<typeof createNotificationsRepository>;
