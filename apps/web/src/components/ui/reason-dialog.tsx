// Say why, then do it: the form behind every action that needs a reason (a moderator's, an admin's,
// a member's report). The reason is checked here before it is sent; the API's refusal of the reason
// shows under the field, any other refusal stays in the form so nothing typed is lost.
import { useState, type ReactNode } from 'react';
import { ErrorPanel } from '../errors/error-panel';
import { isApiError } from '../../lib/api-client';
import { reasonProblem } from '../../lib/edit-reason';
import { Button } from './button';
import { Dialog } from './dialog';
import { ReasonField } from './reason-field';

type ReasonFormProps = {
  reasonLabel: string;
  placeholder?: string | undefined;
  /** a text area of this many lines instead of one line */
  rows?: number;
  /** false when no audit entry keeps the reason */
  audited?: boolean;
  confirmLabel: string;
  /** what the confirm button says while the request runs */
  pendingLabel?: string;
  /** the heading of a refusal that is not about the reason, e.g. "Not merged" */
  failedTitle?: string;
  /** danger for what takes something away from readers (hiding, merging) */
  tone?: 'primary' | 'danger';
  pending: boolean;
  error: unknown;
  onCancel: () => void;
  /** called with the trimmed reason once it passes the check */
  onConfirm: (reason: string) => void;
  /** what the reader should see before saying why, above the reason */
  children?: ReactNode;
  /**
   * The reason held by the caller, for a form that steps away and comes back (picking another
   * case to merge into) without losing what was typed. Left out, the form holds it itself.
   */
  reason?: string;
  onReasonChange?: (reason: string) => void;
};

export function ReasonForm({
  reasonLabel,
  placeholder,
  rows,
  audited,
  confirmLabel,
  pendingLabel = 'Saving…',
  failedTitle = 'Not done',
  tone = 'primary',
  pending,
  error,
  onCancel,
  onConfirm,
  children,
  reason: heldReason,
  onReasonChange,
}: ReasonFormProps) {
  const [ownReason, setOwnReason] = useState('');
  const reason = heldReason ?? ownReason;
  const setReason = onReasonChange ?? setOwnReason;
  const [problem, setProblem] = useState<string | undefined>();
  const fromApi = isApiError(error) ? error.fieldErrors.reason : undefined;
  return (
    <form
      noValidate
      className="space-y-3"
      onSubmit={(event) => {
        event.preventDefault();
        const found = reasonProblem(reason);
        setProblem(found);
        if (!found) onConfirm(reason.trim());
      }}
    >
      {children}
      <ReasonField
        autoFocus
        label={reasonLabel}
        rows={rows}
        audited={audited}
        value={reason}
        onChange={(value) => {
          setReason(value);
          if (problem) setProblem(undefined);
        }}
        error={problem ?? fromApi}
        placeholder={placeholder}
      />
      {error != null && !fromApi && <ErrorPanel compact error={error} title={failedTitle} />}
      <div className="flex justify-end gap-2">
        <Button size="sm" variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" size="sm" variant={tone} disabled={pending}>
          {pending ? pendingLabel : confirmLabel}
        </Button>
      </div>
    </form>
  );
}

type ReasonDialogProps = Omit<
  ReasonFormProps,
  'onCancel' | 'children' | 'reason' | 'onReasonChange'
> & {
  open: boolean;
  onClose: () => void;
  title: string;
  description: ReactNode;
};

/** The dialog renders its content only while open, so each opening starts with an empty reason. */
export function ReasonDialog({ open, onClose, title, description, ...form }: ReasonDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} title={title} description={description}>
      <ReasonForm {...form} onCancel={onClose} />
    </Dialog>
  );
}
