// Who is signed in and what they may do.
import { z } from 'zod';

export const userRoles = ['member', 'moderator', 'admin'] as const;
export const userRoleSchema = z.enum(userRoles);
export type UserRole = z.infer<typeof userRoleSchema>;

/** member < moderator < admin */
export function roleAtLeast(role: UserRole, needed: UserRole): boolean {
  return userRoles.indexOf(role) >= userRoles.indexOf(needed);
}

export const sessionUserSchema = z.object({
  id: z.number().int(),
  login: z.string(),
  name: z.string(),
  avatarUrl: z.string(),
  role: userRoleSchema,
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

export const meResponseSchema = z.object({ user: sessionUserSchema.nullable() });
export type MeResponse = z.infer<typeof meResponseSchema>;

export const adminUserSchema = sessionUserSchema.extend({
  githubId: z.number().int(),
  email: z.string().nullable(),
  bannedAt: z.string().nullable(),
  banReason: z.string(),
  createdAt: z.string(),
  lastSignInAt: z.string().nullable(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;

const reason = z.string().trim().min(3, 'say why, in a few words').max(500);

export const userUpdateSchema = z
  .strictObject({
    role: userRoleSchema.optional(),
    banned: z.boolean().optional(),
    reason,
  })
  .refine((v) => v.role !== undefined || v.banned !== undefined, { message: 'change the role or the ban' });
export type UserUpdate = z.infer<typeof userUpdateSchema>;

export const auditEntrySchema = z.object({
  id: z.number().int(),
  actor: z.object({ id: z.number().int(), login: z.string() }).nullable(),
  action: z.string(),
  targetType: z.string(),
  targetId: z.string(),
  reason: z.string(),
  details: z.record(z.string(), z.unknown()),
  createdAt: z.string(),
  /**
   * Set on actions an admin can take back (a case merge): whether it still can be, and the audit row
   * of the undo once done.
   */
  undo: z.object({ possible: z.boolean(), undoneByEntryId: z.number().int().nullable() }).nullable().optional(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

export const auditUndoInputSchema = z.strictObject({ reason });
export type AuditUndoInput = z.infer<typeof auditUndoInputSchema>;

export const auditQuerySchema = z.strictObject({
  limit: z.coerce.number().int().min(1).max(500).default(100),
  before: z.coerce.number().int().positive().optional(),
});
