// A page (or part of one) that needs a role. A visitor is asked to sign in and brought back here;
// someone signed in with too low a role is told which role it takes. The API checks again anyway.
import type { UserRole } from '@railyard/shared';
import type { ReactNode } from 'react';
import { RoleBadge } from '../../../components/ui/role-badge';
import { hasRole } from '../../../lib/roles';
import { useSignedInUser } from '../../../lib/viewer';
import { SignInLink } from './sign-in-link';

type RoleGateProps = {
  needed: UserRole;
  /** What the role is for, as the start of a sentence: "Importing boards". */
  action: string;
  children: ReactNode;
};

export function RoleGate({ needed, action, children }: RoleGateProps) {
  const user = useSignedInUser();
  if (user === undefined) {
    return (
      <div aria-busy="true" className="h-24 animate-pulse rounded-lg bg-surface">
        <span className="sr-only">Checking who is signed in…</span>
      </div>
    );
  }
  if (hasRole(user, needed)) return children;
  return (
    <section
      aria-label={`${action} needs the ${needed} role`}
      className="rounded-lg border border-line bg-surface px-5 py-4"
    >
      <h2 className="flex flex-wrap items-center gap-2 text-base font-semibold">
        {action} needs the <RoleBadge role={needed} /> role
      </h2>
      {user === null ? (
        <>
          <p className="mt-1.5 text-sm text-ink-muted">
            Sign in with GitHub first; you come back to this page afterwards.
          </p>
          <SignInLink className="mt-3">Sign in with GitHub</SignInLink>
        </>
      ) : (
        <p className="mt-1.5 text-sm text-ink-muted">
          You are signed in as <span className="font-mono text-ink">{user.login}</span> with the{' '}
          <RoleBadge role={user.role} /> role. An administrator can give you the {needed} role.
        </p>
      )}
    </section>
  );
}
