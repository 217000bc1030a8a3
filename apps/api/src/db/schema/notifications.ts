// E-mail notifications: an outbox written in the transaction of the action that causes it, sent later by
// the notification worker, and each person's choice of how (or whether) to get them.
import { sql } from 'drizzle-orm';
import {
  type AnyPgColumn,
  check,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
} from 'drizzle-orm/pg-core';
import {
  notificationKinds,
  notificationModes,
  notificationStatuses,
} from '../../modules/notifications/notification-kinds';
import { createdAt, id } from './columns';
import { users } from './users';

export const notificationKindEnum = pgEnum('notification_kind', notificationKinds);
export const notificationStatusEnum = pgEnum('notification_status', notificationStatuses);
export const notificationModeEnum = pgEnum('notification_mode', notificationModes);

const when = () => timestamp({ withTimezone: true, mode: 'date' });

export const notificationOutbox = pgTable(
  'notification_outbox',
  {
    id: id(),
    userId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    kind: notificationKindEnum().notNull(),
    payload: jsonb().$type<Record<string, unknown>>().notNull(),
    status: notificationStatusEnum().notNull().default('pending'),
    attempts: integer().notNull().default(0),
    nextAttemptAt: when().notNull().defaultNow(),
    lastError: text(),
    /** the digest row that carries this one (daily-digest readers); its status follows the digest's */
    digestId: integer().references((): AnyPgColumn => notificationOutbox.id, {
      onDelete: 'set null',
    }),
    createdAt: createdAt(),
    sentAt: when(),
  },
  (t) => [
    index('notification_outbox_due_idx')
      .on(t.nextAttemptAt)
      .where(sql`${t.status} = 'pending'`),
    index('notification_outbox_user_idx').on(t.userId, t.createdAt),
    index('notification_outbox_digest_idx')
      .on(t.digestId)
      .where(sql`${t.digestId} IS NOT NULL`),
    check('notification_outbox_attempts_check', sql`${t.attempts} >= 0`),
  ],
);

export const notificationPreferences = pgTable('notification_preferences', {
  userId: integer()
    .primaryKey()
    .references(() => users.id, { onDelete: 'cascade' }),
  mode: notificationModeEnum().notNull(),
  updatedAt: when().notNull().defaultNow(),
});
