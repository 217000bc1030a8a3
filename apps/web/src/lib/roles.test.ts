import { roleAtLeast, userRoles, type UserRole } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { hasRole, rolesInOrder } from './roles';

describe('client role ranking', () => {
  it('lists the roles in the order of the API contract', () => {
    // packages/shared/src/auth.ts: userRoles, lowest first
    expect([...rolesInOrder]).toEqual([...userRoles]);
  });

  it('answers like the contract’s roleAtLeast for every pair of roles', () => {
    for (const role of userRoles as readonly UserRole[]) {
      for (const needed of userRoles as readonly UserRole[]) {
        expect(hasRole({ role }, needed), `${role} needing ${needed}`).toBe(
          roleAtLeast(role, needed),
        );
      }
    }
  });

  it('grants nothing to someone signed out', () => {
    expect(hasRole(null, 'member')).toBe(false);
    expect(hasRole(undefined, 'member')).toBe(false);
  });
});
