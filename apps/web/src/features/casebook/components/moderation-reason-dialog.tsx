// The dialog behind every moderator action on a case or a comment: say why, then do it. The reason
// goes to the audit log; a refusal (say, someone locked it a moment earlier) stays in the dialog.
import { useState, type ReactNode } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ReasonField } from '../../../components/ui/reason-field';
import { isApiError } from '../../../lib/api-client';
import { reasonProblem } from '../../../lib/edit-reason';

type ModerationReasonDialogProps = {
  open: boolean;
  onClose: () => void;
  title: string;
  description: ReactNode;
  reasonLabel: string;
  placeholder?: string;
  confirmLabel: string;
  /** danger for what takes something away from readers (hiding) */
  tone?: 'primary' | 'danger';
  pending: boolean;
  error: unknown;
  onConfirm: (reason: string) => void;
};

export function ModerationReasonDialog({
  open,
  onClose,
  title,
  description,
  reasonLabel,
  placeholder,
  confirmLabel,
  tone = 'primary',
  pending,
  error,
  onConfirm,
}: ModerationReasonDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} title={title} description={description}>
      <ReasonForm
        reasonLabel={reasonLabel}
        placeholder={placeholder}
        confirmLabel={confirmLabel}
        tone={tone}
        pending={pending}
        error={error}
        onCancel={onClose}
        onConfirm={onConfirm}
      />
    </Dialog>
  );
}

// Rendered only while the dialog is open, so each opening starts with an empty reason.
function ReasonForm({
  reasonLabel,
  placeholder,
  confirmLabel,
  tone,
  pending,
  error,
  onCancel,
  onConfirm,
}: Omit<ModerationReasonDialogProps, 'open' | 'onClose' | 'title' | 'description'> & {
  onCancel: () => void;
}) {
  const [reason, setReason] = useState('');
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
      <ReasonField
        autoFocus
        label={reasonLabel}
        value={reason}
        onChange={(value) => {
          setReason(value);
          if (problem) setProblem(undefined);
        }}
        error={problem ?? fromApi}
        placeholder={placeholder}
      />
      {error != null && !fromApi && <ErrorPanel compact error={error} title="Not done" />}
      <div className="flex justify-end gap-2">
        <Button size="sm" variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" size="sm" variant={tone} disabled={pending}>
          {pending ? 'Saving…' : confirmLabel}
        </Button>
      </div>
    </form>
  );
}
