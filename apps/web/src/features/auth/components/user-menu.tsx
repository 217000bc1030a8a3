// The top bar's account corner: "Sign in" for a visitor; for someone signed in, their picture,
// login and role, opening a small panel with what their role allows, their pages and sign-out.
// On a development server with a local mailbox, a link to it, for visitors too: it is open to anyone.
import { useEffect, useId, useRef, useState } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { Avatar } from '../../../components/ui/avatar';
import { RoleBadge } from '../../../components/ui/role-badge';
import { paths } from '../../../config/paths';
import { hasRole, roleAbilities } from '../../../lib/roles';
import { useSignedInUser } from '../../../lib/viewer';
import { useSignOut } from '../api/sign-out';
import { SignInLink } from './sign-in-link';

const itemClass =
  'flex w-full items-center gap-2 px-3 py-1.5 text-left text-[13px] text-ink hover:bg-raised disabled:opacity-55';

type UserMenuProps = {
  /** After the session ended: the caller drops what only a signed-in role could read. */
  onSignedOut?: () => void;
  /** whether this server keeps a local mailbox (a development server), decided by the app shell */
  hasMailbox?: boolean;
};

export function UserMenu({ onSignedOut, hasMailbox = false }: UserMenuProps) {
  const user = useSignedInUser();
  const [open, setOpen] = useState(false);
  const id = useId();
  const root = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const signOut = useSignOut({
    onSignedOut: () => {
      setOpen(false);
      onSignedOut?.();
    },
  });

  // A link in the panel was followed: the panel has done its job.
  const { pathname } = useLocation();
  const [openedAt, setOpenedAt] = useState(pathname);
  if (openedAt !== pathname) {
    setOpenedAt(pathname);
    setOpen(false);
  }

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (!root.current?.contains(event.target as Node)) setOpen(false);
    };
    const onKey = (event: KeyboardEvent) => {
      if (event.key !== 'Escape') return;
      setOpen(false);
      button.current?.focus();
    };
    document.addEventListener('pointerdown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, [open]);

  // Not known yet: keep the corner's room without showing either state.
  if (user === undefined) return <span className="inline-block h-7.5 w-20" aria-hidden="true" />;
  if (user === null) {
    return (
      <>
        {hasMailbox && (
          <Link
            to={paths.mailbox.getHref()}
            className="rounded-md px-2 py-1 text-[13px] text-ink-muted hover:text-ink"
          >
            Mailbox
          </Link>
        )}
        <SignInLink />
      </>
    );
  }

  return (
    <div ref={root} className="relative">
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={`${id}-panel`}
        aria-label={`Account: ${user.login}, ${user.role}`}
        onClick={() => setOpen((current) => !current)}
        className={`inline-flex h-7.5 items-center gap-2 rounded-md border pr-2 pl-1 text-[13px] hover:border-line-strong ${
          open ? 'border-line-strong bg-raised' : 'border-line'
        }`}
      >
        <Avatar src={user.avatarUrl} login={user.login} size={22} />
        <span className="hidden max-w-[10rem] truncate font-mono text-ink md:inline">
          {user.login}
        </span>
        {user.role !== 'member' && <RoleBadge role={user.role} />}
        <svg viewBox="0 0 10 10" width="9" height="9" aria-hidden="true" className="text-ink-muted">
          <path
            d="M2 3.5 5 6.5 8 3.5"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.4"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        </svg>
      </button>
      <div
        id={`${id}-panel`}
        hidden={!open}
        className="absolute top-full right-0 z-40 mt-1 w-72 rounded-md border border-line-strong bg-surface py-1 shadow-lg shadow-black/30"
      >
        <div className="flex items-start gap-3 border-b border-line px-3 pt-2 pb-2.5">
          <Avatar src={user.avatarUrl} login={user.login} size={36} />
          <div className="min-w-0 flex-1">
            {user.name && <p className="truncate text-sm font-medium">{user.name}</p>}
            <p className="truncate font-mono text-[13px] text-ink-muted">{user.login}</p>
            <div className="mt-2">
              <RoleBadge role={user.role} />
              <p className="mt-1 text-xs text-ink-muted">{roleAbilities[user.role]}</p>
            </div>
          </div>
        </div>
        <div className="py-1">
          <Link to={paths.notificationSettings.getHref()} className={itemClass}>
            E-mail settings
            <span className="ml-auto text-xs text-ink-faint">what you are sent</span>
          </Link>
          {hasRole(user, 'moderator') && (
            <Link to={paths.moderation.getHref()} className={itemClass}>
              Moderation queue
              <span className="ml-auto text-xs text-ink-faint">flagged content</span>
            </Link>
          )}
          {hasRole(user, 'admin') && (
            <Link to={paths.admin.getHref()} className={itemClass}>
              Administration
              <span className="ml-auto text-xs text-ink-faint">people, roles, audit log</span>
            </Link>
          )}
          {hasMailbox && (
            <Link to={paths.mailbox.getHref()} className={itemClass}>
              Mailbox
              <span className="ml-auto text-xs text-ink-faint">mail this server sent</span>
            </Link>
          )}
          <button
            type="button"
            className={itemClass}
            disabled={signOut.isPending}
            onClick={() => signOut.mutate()}
          >
            {signOut.isPending ? 'Signing out…' : 'Sign out'}
          </button>
          {signOut.isError && (
            <p role="alert" className="px-3 py-1 text-xs text-danger">
              Could not sign out: {signOut.error.message}
            </p>
          )}
        </div>
      </div>
    </div>
  );
}
