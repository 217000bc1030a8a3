// Changing someone's role, or banning them, or lifting a ban: always with a reason, which the
// audit log keeps. The API refuses an admin's ban or demotion of themself; its message shows here.
import type { AdminUser, UserRole } from '@railyard/shared';
import { useState, type FormEvent } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ReasonField } from '../../../components/ui/reason-field';
import { RoleBadge } from '../../../components/ui/role-badge';
import { isApiError } from '../../../lib/api-client';
import { reasonProblem } from '../../../lib/edit-reason';
import { roleAbilities, rolesInOrder } from '../../../lib/roles';
import { useUpdateUser, type UserChange } from '../api/update-user';

export type UserChangeKind = 'role' | 'ban';

type UserChangeDialogProps = {
  /** the person to change; null keeps the dialog closed */
  user: AdminUser | null;
  kind: UserChangeKind;
  onClose: () => void;
};

export function UserChangeDialog({ user, kind, onClose }: UserChangeDialogProps) {
  const banned = user?.bannedAt != null;
  const title = !user
    ? ''
    : kind === 'role'
      ? `Change the role of ${user.login}`
      : banned
        ? `Lift the ban on ${user.login}`
        : `Ban ${user.login}`;
  const description =
    kind === 'role'
      ? 'The new role applies at once, on their next request.'
      : banned
        ? 'They can sign in again.'
        : 'They are signed out at once and cannot sign in until an admin lifts the ban.';
  return (
    <Dialog open={user !== null} onClose={onClose} title={title} description={description}>
      {user && <UserChangeForm user={user} kind={kind} onDone={onClose} />}
    </Dialog>
  );
}

function UserChangeForm({
  user,
  kind,
  onDone,
}: {
  user: AdminUser;
  kind: UserChangeKind;
  onDone: () => void;
}) {
  const banned = user.bannedAt !== null;
  const [role, setRole] = useState<UserRole>(user.role);
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string | undefined>();
  const mutation = useUpdateUser();

  const apiError = isApiError(mutation.error) ? mutation.error : null;
  const fieldErrors = apiError?.fieldErrors ?? {};
  // The API names the field it refused (`role`, `banned`); those are shown with the choice made.
  const choiceError = fieldErrors.role ?? fieldErrors.banned;
  const shownReasonError = reasonError ?? fieldErrors.reason;
  const otherError = mutation.isError && !choiceError && !fieldErrors.reason;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const problem = reasonProblem(reason);
    setReasonError(problem);
    if (problem) return;
    const change: UserChange =
      kind === 'role'
        ? { role, reason: reason.trim() }
        : { banned: !banned, reason: reason.trim() };
    mutation.mutate({ id: user.id, change }, { onSuccess: onDone });
  };

  return (
    <form onSubmit={submit} noValidate className="space-y-3.5">
      {kind === 'role' ? (
        <fieldset aria-describedby={choiceError ? 'role-choice-error' : undefined}>
          <legend className="text-[13px] font-medium">Role</legend>
          <div className="mt-1.5 space-y-1">
            {rolesInOrder.map((option) => (
              <label
                key={option}
                className={`flex cursor-pointer items-center gap-2.5 rounded-md border px-2.5 py-1.5 text-[13px] ${
                  role === option
                    ? 'border-accent/60 bg-select'
                    : 'border-line hover:border-line-strong'
                }`}
              >
                <input
                  type="radio"
                  name="role"
                  value={option}
                  checked={role === option}
                  onChange={() => setRole(option)}
                  className="accent-(--ry-accent)"
                />
                <RoleBadge role={option} />
                <span className="text-ink-muted">{roleAbilities[option]}</span>
                {option === user.role && (
                  <span className="ml-auto text-xs text-ink-faint">current</span>
                )}
              </label>
            ))}
          </div>
        </fieldset>
      ) : (
        banned && (
          <p className="rounded-md border border-line bg-raised px-3 py-2 text-[13px]">
            Banned{user.banReason ? ':' : '.'}{' '}
            {user.banReason && <span className="text-ink-muted">“{user.banReason}”</span>}
          </p>
        )
      )}
      {choiceError && (
        <p id="role-choice-error" role="alert" className="text-[13px] text-danger">
          {choiceError}
        </p>
      )}
      <ReasonField
        value={reason}
        error={shownReasonError}
        autoFocus
        onChange={(value) => {
          setReason(value);
          if (reasonError) setReasonError(undefined);
        }}
      />
      {otherError && <ErrorPanel compact error={mutation.error} />}
      <div className="flex justify-end gap-2 pt-1">
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
        <Button
          type="submit"
          variant={kind === 'ban' && !banned ? 'danger' : 'primary'}
          disabled={mutation.isPending || (kind === 'role' && role === user.role)}
        >
          {mutation.isPending
            ? 'Saving…'
            : kind === 'role'
              ? 'Change the role'
              : banned
                ? 'Lift the ban'
                : 'Ban'}
        </Button>
      </div>
    </form>
  );
}
