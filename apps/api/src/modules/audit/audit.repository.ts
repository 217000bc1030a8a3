// The audit log: every privileged action, with who did it, to what, when and why.
import { desc, eq, lt, sql, type SQL } from 'drizzle-orm';
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

/** Writes the row and answers its id. */
export async function writeAudit(db: Writer, record: AuditRecord): Promise<number> {
  const [row] = await db
    .insert(auditLog)
    .values({ ...record, reason: record.reason ?? '', details: record.details ?? {} })
    .returning({ id: auditLog.id });
  return row!.id;
}

/** The only action an admin can take back; its undo is written as `case.unmerge` with `details.undoes`. */
const undoableAction = 'case.merge';

/** The `case.unmerge` row that undid this merge row, if any. */
const undoneBy = sql<number | null>`(
  SELECT x.id FROM audit_log x
  WHERE x.target_type = 'case' AND x.target_id = ${auditLog.targetId} AND x.action = 'case.unmerge'
    AND x.details->>'undoes' = ${auditLog.id}::text
  ORDER BY x.id LIMIT 1)`;

/**
 * Whether the merge could be undone now: not undone yet, the duplicate still merged into the case the
 * row names, and that case not merged on into another (that merge is undone first).
 */
const undoPossible = sql<boolean>`(
  NOT EXISTS (
    SELECT 1 FROM audit_log x
    WHERE x.target_type = 'case' AND x.target_id = ${auditLog.targetId} AND x.action = 'case.unmerge'
      AND x.details->>'undoes' = ${auditLog.id}::text)
  AND EXISTS (
    SELECT 1 FROM cases f JOIN cases i ON i.id = f.merged_into_id
    WHERE f.id::text = ${auditLog.targetId} AND f.merged_into_id::text = ${auditLog.details}->>'intoCaseId'
      AND i.merged_into_id IS NULL))`;

export function createAuditRepository(db: Database) {
  async function select(where: SQL | undefined, limit: number): Promise<AuditEntry[]> {
    const undoable = sql`${auditLog.action} = ${undoableAction}`;
    const rows = await db
      .select({
        entry: auditLog,
        actorLogin: users.login,
        undoneBy: sql<number | null>`CASE WHEN ${undoable} THEN ${undoneBy} END`,
        undoPossible: sql<boolean | null>`CASE WHEN ${undoable} THEN ${undoPossible} END`,
      })
      .from(auditLog)
      .leftJoin(users, eq(users.id, auditLog.actorId))
      .where(where)
      .orderBy(desc(auditLog.id))
      .limit(limit);
    return rows.map(({ entry, actorLogin, undoneBy: undoneByEntryId, undoPossible: possible }) => ({
      id: entry.id,
      actor: entry.actorId !== null && actorLogin !== null ? { id: entry.actorId, login: actorLogin } : null,
      action: entry.action,
      targetType: entry.targetType,
      targetId: entry.targetId,
      reason: entry.reason,
      details: entry.details,
      createdAt: entry.createdAt.toISOString(),
      ...(entry.action === undoableAction ? { undo: { possible: possible === true, undoneByEntryId: undoneByEntryId ?? null } } : {}),
    }));
  }

  return {
    list: (limit: number, before?: number) => select(before === undefined ? undefined : lt(auditLog.id, before), limit),

    async find(id: number): Promise<AuditEntry | null> {
      const [entry] = await select(eq(auditLog.id, id), 1);
      return entry ?? null;
    },
  };
}

export type AuditRepository = ReturnType<typeof createAuditRepository>;
