// "Report": a signed-in member tells the moderators that a case or a comment needs a look (spam,
// a dangerous instruction, someone's phone number). The moderators read the reason in their queue.
import { useState, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ReasonForm } from '../../../components/ui/reason-dialog';
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
          <ReasonForm
            reasonLabel="What is wrong with it"
            rows={3}
            audited={false}
            placeholder="e.g. advertises a repair shop; the same text is on three boards"
            confirmLabel="Report to the moderators"
            pendingLabel="Sending…"
            failedTitle="Not reported"
            pending={flag.isPending}
            error={flag.error}
            onCancel={() => setOpen(false)}
            onConfirm={(reason) => flag.mutate(reason)}
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
