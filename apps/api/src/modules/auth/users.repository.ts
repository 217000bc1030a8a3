import { asc, eq, sql } from 'drizzle-orm';
import type { AdminUser, SessionUser, UserRole } from '@railyard/shared';
import type { Database } from '../../db/client';
import { users } from '../../db/schema';
import { writeAudit } from '../audit/audit.repository';

export type UserRow = typeof users.$inferSelect;

export interface GitHubIdentity {
  githubId: number;
  login: string;
  name: string;
  email: string | null;
  avatarUrl: string;
}

export function toSessionUser(row: UserRow): SessionUser {
  return { id: row.id, login: row.login, name: row.name, avatarUrl: row.avatarUrl, role: row.role };
}

export function toAdminUser(row: UserRow): AdminUser {
  return {
    ...toSessionUser(row),
    githubId: row.githubId,
    email: row.email,
    bannedAt: row.bannedAt?.toISOString() ?? null,
    banReason: row.banReason,
    createdAt: row.createdAt.toISOString(),
    lastSignInAt: row.lastSignInAt?.toISOString() ?? null,
  };
}

export function createUsersRepository(db: Database) {
  return {
    async findById(id: number): Promise<UserRow | null> {
      const rows = await db.select().from(users).where(eq(users.id, id));
      return rows[0] ?? null;
    },

    async findByLoginOrGitHubId(key: string): Promise<UserRow | null> {
      const byId = /^\d+$/.test(key) ? eq(users.githubId, Number(key)) : undefined;
      const rows = await db
        .select()
        .from(users)
        .where(byId ?? sql`lower(${users.login}) = lower(${key})`);
      return rows[0] ?? null;
    },

    /** Creates or refreshes the account behind a GitHub sign-in; promotes configured admins. */
    async signIn(identity: GitHubIdentity, makeAdmin: boolean): Promise<UserRow> {
      return db.transaction(async (tx) => {
        const [row] = await tx
          .insert(users)
          .values({ ...identity, lastSignInAt: new Date() })
          .onConflictDoUpdate({
            target: users.githubId,
            set: {
              login: identity.login,
              name: identity.name,
              email: identity.email,
              avatarUrl: identity.avatarUrl,
              lastSignInAt: new Date(),
            },
          })
          .returning();
        if (makeAdmin && row!.role !== 'admin') {
          const [promoted] = await tx.update(users).set({ role: 'admin' }).where(eq(users.id, row!.id)).returning();
          await writeAudit(tx, {
            actorId: null,
            action: 'user.role',
            targetType: 'user',
            targetId: String(row!.id),
            reason: 'named in RAILYARD_ADMINS',
            details: { from: row!.role, to: 'admin' },
          });
          return promoted!;
        }
        return row!;
      });
    },

    async list(): Promise<UserRow[]> {
      return db.select().from(users).orderBy(asc(users.login));
    },

    /** Changes role and/or ban in one transaction with its audit row. */
    async update(
      target: UserRow,
      change: { role?: UserRole; banned?: boolean; reason: string },
      actorId: number | null,
    ): Promise<UserRow> {
      return db.transaction(async (tx) => {
        const set: Partial<typeof users.$inferInsert> = {};
        if (change.role !== undefined && change.role !== target.role) {
          set.role = change.role;
          await writeAudit(tx, {
            actorId,
            action: 'user.role',
            targetType: 'user',
            targetId: String(target.id),
            reason: change.reason,
            details: { from: target.role, to: change.role },
          });
        }
        if (change.banned !== undefined && change.banned !== (target.bannedAt !== null)) {
          set.bannedAt = change.banned ? new Date() : null;
          set.banReason = change.banned ? change.reason : '';
          await writeAudit(tx, {
            actorId,
            action: change.banned ? 'user.ban' : 'user.unban',
            targetType: 'user',
            targetId: String(target.id),
            reason: change.reason,
          });
        }
        if (Object.keys(set).length === 0) return target;
        const [row] = await tx.update(users).set(set).where(eq(users.id, target.id)).returning();
        return row!;
      });
    },
  };
}

export type UsersRepository = ReturnType<typeof createUsersRepository>;
