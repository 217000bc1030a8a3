// What privileged people did, newest first: who, what, to what, when, why, and the details.
// Older entries come a page at a time.
import { useMemo } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { formatDateTime } from '../../../lib/date-format';
import { formatCount } from '../../../lib/quantity-format';
import { useAdminUsers } from '../api/get-admin-users';
import { useAuditLog } from '../api/get-audit-log';
import { describeAuditEntry } from '../audit-entry-text';

const headClass = 'px-3 py-2 text-left text-xs font-medium text-ink-muted whitespace-nowrap';
const cellClass = 'px-3 py-1.5 align-top';

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
          Nothing recorded yet. Role changes, bans and edits of boards appear here.
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
