// "Report": a signed-in member tells the moderators that a case or a comment needs a look (spam,
// a dangerous instruction, someone's phone number). The moderators read the reason in their queue.
import { useState, type ReactNode } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, TextArea } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { reasonMaxLength, reasonProblem } from '../../../lib/edit-reason';
import { isAlreadyFlagged, useFlagContent, type FlagTarget } from '../api/flag-content';

type ReportButtonProps = { target: FlagTarget; className?: string };

export function ReportButton({ target, className }: ReportButtonProps) {
  const [open, setOpen] = useState(false);
  const flag = useFlagContent(target);
  // Reported (or reported before) during this visit: the button says so instead of asking again.
  const done = flag.isSuccess || isAlreadyFlagged(flag.error);
  return (
    <>
      <Button
        size="sm"
        variant="ghost"
        className={className}
        title={
          done
            ? 'Moderators will look at it'
            : `Tell the moderators this ${target.type} needs a look`
        }
        onClick={() => setOpen(true)}
      >
        {done ? 'Reported' : 'Report'}
      </Button>
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title={`Report this ${target.type}`}
        description="Moderators see your reason and your name. Use it for spam, abuse, personal data or advice that can hurt someone or a board, not to disagree with a fix (vote or comment for that)."
      >
        {flag.isSuccess ? (
          <Outcome onClose={() => setOpen(false)}>Reported — moderators will look at it.</Outcome>
        ) : isAlreadyFlagged(flag.error) ? (
          <Outcome onClose={() => setOpen(false)}>
            You reported this {target.type} already; moderators will look at it.
          </Outcome>
        ) : (
          <ReportForm
            pending={flag.isPending}
            error={flag.error}
            onCancel={() => setOpen(false)}
            onSubmit={(reason) => flag.mutate(reason)}
          />
        )}
      </Dialog>
    </>
  );
}

function Outcome({ children, onClose }: { children: ReactNode; onClose: () => void }) {
  return (
    <div className="space-y-3">
      <p role="status" className="rounded-md border border-ok/40 bg-ok-soft px-3 py-2 text-[13px]">
        {children}
      </p>
      <div className="flex justify-end">
        <Button size="sm" onClick={onClose}>
          Close
        </Button>
      </div>
    </div>
  );
}

function ReportForm({
  pending,
  error,
  onCancel,
  onSubmit,
}: {
  pending: boolean;
  error: unknown;
  onCancel: () => void;
  onSubmit: (reason: string) => void;
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
        if (!found) onSubmit(reason.trim());
      }}
    >
      <Field label="What is wrong with it" error={problem ?? fromApi}>
        {(control) => (
          <TextArea
            {...control}
            rows={3}
            autoFocus
            maxLength={reasonMaxLength}
            value={reason}
            placeholder="e.g. advertises a repair shop; the same text is on three boards"
            onChange={(event) => {
              setReason(event.target.value);
              if (problem) setProblem(undefined);
            }}
          />
        )}
      </Field>
      {error != null && !fromApi && <ErrorPanel compact error={error} title="Not reported" />}
      <div className="flex justify-end gap-2">
        <Button size="sm" variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" size="sm" variant="primary" disabled={pending}>
          {pending ? 'Sending…' : 'Report to the moderators'}
        </Button>
      </div>
    </form>
  );
}
