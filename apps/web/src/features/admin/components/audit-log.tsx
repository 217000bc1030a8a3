// What privileged people did, newest first: who, what, to what, when, why, and the details.
// Older entries come a page at a time. A case merge can be taken back from its entry.
import type { AuditEntry } from '@railyard/shared';
import { useMemo, useState } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { ReasonDialog } from '../../../components/ui/reason-dialog';
import { formatDateTime } from '../../../lib/date-format';
import { formatCount } from '../../../lib/quantity-format';
import { useAdminUsers } from '../api/get-admin-users';
import { useAuditLog } from '../api/get-audit-log';
import { useUndoAuditEntry } from '../api/undo-audit-entry';
import { describeAuditEntry } from '../audit-entry-text';

const headClass = 'px-3 py-2 text-left text-xs font-medium text-ink-muted whitespace-nowrap';
const cellClass = 'px-3 py-1.5 align-top';

function UndoMergeDialog({
  entry,
  open,
  onClose,
}: {
  entry: AuditEntry;
  open: boolean;
  onClose: () => void;
}) {
  const undo = useUndoAuditEntry();
  const close = () => {
    undo.reset();
    onClose();
  };
  return (
    <ReasonDialog
      open={open}
      onClose={close}
      title={`Undo the merge of case #${entry.targetId}?`}
      description="The duplicate becomes a case of its own again: the links, readings, files, comments, votes and confirmations the merge moved go back to it, and its address stops leading to the kept case. Rows removed from the kept case since are not brought back."
      reasonLabel="Why you undo it"
      placeholder="e.g. the two cases are different faults on the same rail"
      confirmLabel="Undo the merge"
      pendingLabel="Undoing…"
      failedTitle="Not undone"
      tone="danger"
      pending={undo.isPending}
      error={undo.error}
      onConfirm={(reason) => undo.mutate({ id: entry.id, reason }, { onSuccess: close })}
    />
  );
}

/** Under a merge's entry: the way to take it back, or what became of it. */
function MergeUndo({ entry }: { entry: AuditEntry }) {
  const [open, setOpen] = useState(false);
  const undo = entry.undo;
  if (!undo) return null;
  if (undo.undoneByEntryId !== null) {
    return (
      <p className="mt-0.5 text-xs text-ink-muted">
        undone (entry <span className="font-mono">#{undo.undoneByEntryId}</span>)
      </p>
    );
  }
  if (!undo.possible) {
    return (
      <p
        className="mt-0.5 text-xs text-ink-faint"
        title="The kept case was merged on into another case (undo that merge first), or a case is gone"
      >
        can no longer be undone
      </p>
    );
  }
  return (
    <>
      <Button size="sm" className="mt-1 h-6 px-2 text-xs" onClick={() => setOpen(true)}>
        Undo merge
      </Button>
      <UndoMergeDialog entry={entry} open={open} onClose={() => setOpen(false)} />
    </>
  );
}

export function AuditLog() {
  const log = useAuditLog();
  const { data: people } = useAdminUsers();
  const loginById = useMemo(
    () => new Map(people.users.map((user) => [String(user.id), user.login])),
    [people.users],
  );
  const entries = useMemo(() => log.data.pages.flatMap((page) => page.entries), [log.data.pages]);

  return (
    <section aria-labelledby="audit-title" className="rounded-lg border border-line bg-surface">
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="audit-title" className="text-sm font-semibold">
          Audit log
        </h2>
        <span className="text-xs text-ink-muted">
          {formatCount(entries.length)} {entries.length === 1 ? 'entry' : 'entries'} shown, newest
          first
        </span>
      </header>
      {entries.length === 0 ? (
        <p className="px-4 py-8 text-center text-sm text-ink-muted">
          Nothing recorded yet. Role changes, bans, edits of boards and moderators’ actions on cases
          appear here.
        </p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[60rem] border-collapse text-[13px]">
            <thead className="border-b border-line bg-raised/60">
              <tr>
                <th scope="col" className={headClass}>
                  When
                </th>
                <th scope="col" className={headClass}>
                  Who
                </th>
                <th scope="col" className={headClass}>
                  What
                </th>
                <th scope="col" className={headClass}>
                  Why
                </th>
                <th scope="col" className={headClass}>
                  Details
                </th>
              </tr>
            </thead>
            <tbody>
              {entries.map((entry) => {
                const line = describeAuditEntry(entry, (id) => loginById.get(id));
                return (
                  <tr key={entry.id} className="border-b border-line/70 last:border-b-0">
                    <td className={`${cellClass} whitespace-nowrap`}>
                      <time
                        dateTime={entry.createdAt}
                        className="font-mono text-xs text-ink-muted tabular"
                      >
                        {formatDateTime(entry.createdAt)}
                      </time>
                    </td>
                    <td className={`${cellClass} font-mono whitespace-nowrap`}>
                      {entry.actor ? (
                        entry.actor.login
                      ) : (
                        <span
                          className="font-sans text-ink-muted"
                          title="Done by the server itself or from its command line"
                        >
                          system
                        </span>
                      )}
                    </td>
                    <td className={cellClass}>
                      <span className="text-ink-muted">{line.what}</span>{' '}
                      <span className="font-mono wrap-break-word">{line.target}</span>
                      <MergeUndo entry={entry} />
                    </td>
                    <td className={`${cellClass} max-w-[20rem]`}>
                      {entry.reason || <span className="text-ink-faint">no reason given</span>}
                    </td>
                    <td className={cellClass}>
                      {line.details.length > 0 && (
                        <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-2 text-xs">
                          {line.details.map(([label, value]) => (
                            <div key={label} className="contents">
                              <dt className="text-ink-faint">{label}</dt>
                              <dd className="truncate font-mono text-ink-muted" title={value}>
                                {value}
                              </dd>
                            </div>
                          ))}
                        </dl>
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      {log.isFetchNextPageError && (
        <div className="border-t border-line p-2">
          <ErrorPanel compact error={log.error} title="Could not load older entries" />
        </div>
      )}
      {log.hasNextPage && (
        <div className="flex items-center gap-3 border-t border-line px-3 py-2">
          <Button
            size="sm"
            onClick={() => void log.fetchNextPage()}
            disabled={log.isFetchingNextPage}
          >
            {log.isFetchingNextPage ? 'Loading…' : 'Older entries'}
          </Button>
        </div>
      )}
    </section>
  );
}
