// People, their sessions, what privileged people did (audit), and rate-limit counters.
import { bigint, index, integer, jsonb, pgEnum, pgTable, text, timestamp, varchar, json } from 'drizzle-orm/pg-core';
import { userRoles } from '@railyard/shared';
import { createdAt, id } from './columns';

export const userRoleEnum = pgEnum('user_role', userRoles);

export const users = pgTable('users', {
  id: id(),
  /** GitHub's numeric user id: the account key (logins and e-mails can change hands) */
  githubId: bigint({ mode: 'number' }).notNull().unique(),
  login: text().notNull(),
  name: text().notNull().default(''),
  /** only a primary, verified address */
  email: text(),
  avatarUrl: text().notNull().default(''),
  role: userRoleEnum().notNull().default('member'),
  bannedAt: timestamp({ withTimezone: true, mode: 'date' }),
  banReason: text().notNull().default(''),
  createdAt: createdAt(),
  lastSignInAt: timestamp({ withTimezone: true, mode: 'date' }),
});

/** connect-pg-simple's table, owned by the migrations (the store's own create-table is off). */
export const userSessions = pgTable(
  'user_sessions',
  {
    sid: varchar().primaryKey(),
    sess: json().notNull(),
    expire: timestamp({ precision: 6, mode: 'date' }).notNull(),
  },
  (t) => [index('user_sessions_expire_idx').on(t.expire)],
);

export const auditLog = pgTable(
  'audit_log',
  {
    id: id(),
    actorId: integer().references(() => users.id, { onDelete: 'set null' }),
    /** e.g. "user.role", "user.ban", "power-link.add", "net.update" */
    action: text().notNull(),
    targetType: text().notNull(),
    targetId: text().notNull(),
    reason: text().notNull().default(''),
    details: jsonb().$type<Record<string, unknown>>().notNull().default({}),
    createdAt: createdAt(),
  },
  (t) => [index('audit_log_created_idx').on(t.createdAt), index('audit_log_target_idx').on(t.targetType, t.targetId)],
);

/** Fixed-window counters shared by every API process (express-rate-limit store). */
export const rateLimitHits = pgTable('rate_limit_hits', {
  key: text().primaryKey(),
  hits: integer().notNull(),
  resetAt: timestamp({ withTimezone: true, mode: 'date' }).notNull(),
});
