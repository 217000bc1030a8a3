// Roles as the client ranks them: member < moderator < admin. Kept here rather than taken from the
// contract's `roleAtLeast`, whose module would bring the contract's validation code into every page
// for three words; roles.test.ts holds the two to the same answers.
import type { SessionUser, UserRole } from '@railyard/shared';

export const rolesInOrder = ['member', 'moderator', 'admin'] as const satisfies readonly UserRole[];

const rank: Record<UserRole, number> = { member: 0, moderator: 1, admin: 2 };

/** Whether `user` is signed in with at least the `needed` role. */
export function hasRole(user: Pick<SessionUser, 'role'> | null | undefined, needed: UserRole) {
  return user != null && rank[user.role] >= rank[needed];
}

/** What each role may do, in the words the interface uses. */
export const roleAbilities: Record<UserRole, string> = {
  member: 'Reads boards and rails.',
  moderator: 'Also edits rails, power links and board roots.',
  admin: 'Also imports boards, changes roles and bans.',
};
