// Everyone who has signed in, with their role and standing; each row opens the role or ban dialog.
import type { AdminUser, UserRole } from '@railyard/shared';
import { useDeferredValue, useMemo, useState } from 'react';
import { Avatar } from '../../../components/ui/avatar';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { RoleBadge } from '../../../components/ui/role-badge';
import { formatDateTime } from '../../../lib/date-format';
import { formatCount } from '../../../lib/quantity-format';
import { rolesInOrder } from '../../../lib/roles';
import { useAdminUsers } from '../api/get-admin-users';
import { UserChangeDialog, type UserChangeKind } from './user-change-dialog';

const headClass = 'h-8 px-3 text-left text-xs font-medium text-ink-muted whitespace-nowrap';
const cellClass = 'px-3 py-2 align-middle';
const blank = <span className="text-ink-faint">—</span>;

function When({ iso }: { iso: string | null }) {
  if (!iso) return blank;
  return (
    <time dateTime={iso} className="font-mono text-xs whitespace-nowrap text-ink-muted tabular">
      {formatDateTime(iso)}
    </time>
  );
}

function Standing({ user }: { user: AdminUser }) {
  if (!user.bannedAt) return <span className="text-xs text-ok">active</span>;
  return (
    <div className="min-w-0">
      <span className="inline-flex h-5 items-center rounded border border-danger/40 bg-danger-soft px-1.5 text-[11.5px] font-medium text-danger">
        banned
      </span>{' '}
      <When iso={user.bannedAt} />
      {user.banReason && (
        <p className="mt-0.5 truncate text-xs text-ink-muted" title={user.banReason}>
          {user.banReason}
        </p>
      )}
    </div>
  );
}

type StandingFilter = 'any' | 'banned';

/** Whether a person matches the filter text (login, name or e-mail), role and standing. */
function matches(user: AdminUser, text: string, role: UserRole | 'any', standing: StandingFilter) {
  if (role !== 'any' && user.role !== role) return false;
  if (standing === 'banned' && !user.bannedAt) return false;
  if (text === '') return true;
  return [user.login, user.name, user.email ?? ''].some((field) =>
    field.toLowerCase().includes(text),
  );
}

export function UsersTable({ currentUserId }: { currentUserId: number | null }) {
  const { data } = useAdminUsers();
  const [text, setText] = useState('');
  const [role, setRole] = useState<UserRole | 'any'>('any');
  const [standing, setStanding] = useState<StandingFilter>('any');
  const query = useDeferredValue(text.trim().toLowerCase());
  const shown = useMemo(
    () => data.users.filter((user) => matches(user, query, role, standing)),
    [data.users, query, role, standing],
  );
  // The row as it was when the dialog opened: its title must not flip once the change lands.
  const [open, setOpen] = useState<{ user: AdminUser; kind: UserChangeKind } | null>(null);

  return (
    <section aria-labelledby="users-title" className="rounded-lg border border-line bg-surface">
      <header className="flex flex-wrap items-center gap-x-2 gap-y-2 border-b border-line px-3 py-2">
        <h2 id="users-title" className="text-sm font-semibold">
          People
        </h2>
        <span className="text-xs text-ink-muted" aria-live="polite">
          {shown.length === data.users.length
            ? `${formatCount(data.users.length)} ${data.users.length === 1 ? 'account' : 'accounts'}`
            : `${formatCount(shown.length)} of ${formatCount(data.users.length)} accounts`}
        </span>
        <div role="search" className="ml-auto flex flex-wrap items-center gap-2">
          <label className="sr-only" htmlFor="people-filter">
            Filter people by login, name or e-mail
          </label>
          <div className="w-64">
            <input
              id="people-filter"
              type="search"
              value={text}
              onChange={(event) => setText(event.target.value)}
              placeholder="Filter by login, name or e-mail"
              autoComplete="off"
              spellCheck={false}
              className={`${controlClass} h-7.5 text-[13px]`}
            />
          </div>
          <label className="sr-only" htmlFor="people-role">
            Role
          </label>
          <div className="w-36">
            <select
              id="people-role"
              value={role}
              onChange={(event) => setRole(event.target.value as UserRole | 'any')}
              className={`${controlClass} h-7.5 text-[13px]`}
            >
              <option value="any">every role</option>
              {rolesInOrder.map((option) => (
                <option key={option} value={option}>
                  {option}s
                </option>
              ))}
            </select>
          </div>
          <label className="inline-flex items-center gap-1.5 text-[13px] text-ink-muted">
            <input
              type="checkbox"
              checked={standing === 'banned'}
              onChange={(event) => setStanding(event.target.checked ? 'banned' : 'any')}
              className="size-3.5 accent-(--ry-accent)"
            />
            banned only
          </label>
        </div>
      </header>
      <div className="max-h-[32rem] overflow-auto">
        <table className="w-full min-w-[60rem] border-collapse text-[13px]">
          <thead className="sticky top-0 z-10 bg-raised shadow-[0_1px_0_var(--ry-line)]">
            <tr>
              <th scope="col" className={headClass}>
                Person
              </th>
              <th scope="col" className={headClass}>
                Role
              </th>
              <th scope="col" className={headClass}>
                E-mail
              </th>
              <th scope="col" className={headClass}>
                Joined
              </th>
              <th scope="col" className={headClass}>
                Last sign-in
              </th>
              <th scope="col" className={headClass}>
                Standing
              </th>
              <th scope="col" className={headClass}>
                <span className="sr-only">Changes</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {shown.map((user) => (
              <tr
                key={user.id}
                aria-label={user.login}
                className="border-b border-line/70 last:border-b-0 hover:bg-raised/40"
              >
                <td className={cellClass}>
                  <div className="flex items-center gap-2.5">
                    <Avatar src={user.avatarUrl} login={user.login} size={26} />
                    <div className="min-w-0">
                      <p className="truncate font-mono font-medium">
                        {user.login}
                        {user.id === currentUserId && (
                          <span className="ml-1.5 font-sans text-xs font-normal text-ink-faint">
                            you
                          </span>
                        )}
                      </p>
                      <p className="truncate text-xs text-ink-muted">{user.name || blank}</p>
                    </div>
                  </div>
                </td>
                <td className={cellClass}>
                  <RoleBadge role={user.role} />
                </td>
                <td className={`${cellClass} max-w-[16rem] truncate text-ink-muted`}>
                  {user.email ?? blank}
                </td>
                <td className={cellClass}>
                  <When iso={user.createdAt} />
                </td>
                <td className={cellClass}>
                  <When iso={user.lastSignInAt} />
                </td>
                <td className={`${cellClass} max-w-[14rem]`}>
                  <Standing user={user} />
                </td>
                <td className={`${cellClass} text-right whitespace-nowrap`}>
                  <Button size="sm" onClick={() => setOpen({ user, kind: 'role' })}>
                    Change role
                  </Button>{' '}
                  <Button size="sm" variant="ghost" onClick={() => setOpen({ user, kind: 'ban' })}>
                    {user.bannedAt ? 'Lift ban' : 'Ban'}
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        {shown.length === 0 && (
          <p className="px-4 py-8 text-center text-sm text-ink-muted">
            Nobody matches this filter.
          </p>
        )}
      </div>
      <UserChangeDialog
        user={open?.user ?? null}
        kind={open?.kind ?? 'role'}
        onClose={() => setOpen(null)}
      />
    </section>
  );
}
