// The audit log: every privileged action, with who did it, to what, when and why.
import { desc, eq, lt } from 'drizzle-orm';
import type { AuditEntry } from '@railyard/shared';
import type { Database } from '../../db/client';
import { auditLog, users } from '../../db/schema';

export interface AuditRecord {
  actorId: number | null;
  action: string;
  targetType: string;
  targetId: string;
  reason?: string;
  details?: Record<string, unknown>;
}

/** Anything with Drizzle's insert: the database or an open transaction, so the row commits with the change. */
type Writer = Pick<Database, 'insert'>;

export async function writeAudit(db: Writer, record: AuditRecord): Promise<void> {
  await db.insert(auditLog).values({ ...record, reason: record.reason ?? '', details: record.details ?? {} });
}

export function createAuditRepository(db: Database) {
  return {
    async list(limit: number, before?: number): Promise<AuditEntry[]> {
      const rows = await db
        .select({ entry: auditLog, actorLogin: users.login })
        .from(auditLog)
        .leftJoin(users, eq(users.id, auditLog.actorId))
        .where(before === undefined ? undefined : lt(auditLog.id, before))
        .orderBy(desc(auditLog.id))
        .limit(limit);
      return rows.map(({ entry, actorLogin }) => ({
        id: entry.id,
        actor: entry.actorId !== null && actorLogin !== null ? { id: entry.actorId, login: actorLogin } : null,
        action: entry.action,
        targetType: entry.targetType,
        targetId: entry.targetId,
        reason: entry.reason,
        details: entry.details,
        createdAt: entry.createdAt.toISOString(),
      }));
    },
  };
}

export type AuditRepository = ReturnType<typeof createAuditRepository>;
