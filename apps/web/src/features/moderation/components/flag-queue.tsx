// The moderators' queue of reports: what was reported, why, by whom and when, oldest first, so the
// longest-waiting report is handled first. A moderator reads the case (or the comment in its place),
// acts there if needed (hide, lock, merge), then resolves the report here saying what was done.
import type { CaseFlag } from '@railyard/shared';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { ReasonDialog } from '../../../components/ui/reason-dialog';
import { formatDateTime } from '../../../lib/date-format';
import { formatCount } from '../../../lib/quantity-format';
import { useFlags } from '../api/get-flags';
import { useResolveFlag } from '../api/resolve-flag';
import {
  flaggedContentHref,
  flaggedContentLabel,
  flagQueueHref,
  flagStatuses,
  type FlagStatus,
} from '../flag-queue';

const headClass = 'px-3 py-2 text-left text-xs font-medium text-ink-muted whitespace-nowrap';
const cellClass = 'px-3 py-1.5 align-top';

const tabLabel: Record<FlagStatus, string> = { open: 'Open', resolved: 'Resolved' };

function Person({ person }: { person: { login: string; name: string } }) {
  return person.name ? (
    <span title={person.login}>{person.name}</span>
  ) : (
    <span className="font-mono">{person.login}</span>
  );
}

function Moment({ at }: { at: string | null }) {
  if (!at) return null;
  return (
    <time dateTime={at} className="font-mono text-xs text-ink-muted tabular">
      {formatDateTime(at)}
    </time>
  );
}

export function FlagQueueTabs({ status }: { status: FlagStatus }) {
  return (
    <nav aria-label="Reports" className="mb-3 flex gap-1 border-b border-line">
      {flagStatuses.map((tab) => (
        <Link
          key={tab}
          to={flagQueueHref(tab)}
          aria-current={tab === status ? 'page' : undefined}
          className={`-mb-px border-b-2 px-3 py-1.5 text-[13px] font-medium ${
            tab === status
              ? 'border-accent text-ink'
              : 'border-transparent text-ink-muted hover:text-ink'
          }`}
        >
          {tabLabel[tab]}
        </Link>
      ))}
    </nav>
  );
}

function ResolveFlagDialog({ flag, onClose }: { flag: CaseFlag | null; onClose: () => void }) {
  const resolve = useResolveFlag();
  const close = () => {
    resolve.reset();
    onClose();
  };
  return (
    <ReasonDialog
      open={flag !== null}
      onClose={close}
      title={flag ? `Resolve the report of ${flaggedContentLabel(flag).toLowerCase()}` : ''}
      description="Say what you did about it, or why nothing needed doing. The audit log keeps it; the report moves to the resolved list."
      reasonLabel="What you did"
      placeholder="e.g. hid the comment; or: the fix is unusual but correct"
      confirmLabel="Resolve the report"
      failedTitle="Not resolved"
      pending={resolve.isPending}
      error={resolve.error}
      onConfirm={(reason) => {
        if (flag) resolve.mutate({ id: flag.id, reason }, { onSuccess: close });
      }}
    />
  );
}

function FlaggedContent({ flag }: { flag: CaseFlag }) {
  const href = flaggedContentHref(flag);
  const label = flaggedContentLabel(flag);
  return (
    <span className="flex items-baseline gap-1.5 whitespace-nowrap">
      <span
        className={`rounded border px-1 text-[11px] leading-4 ${
          flag.contentType === 'case'
            ? 'border-accent/40 text-accent'
            : 'border-line-strong text-ink-muted'
        }`}
      >
        {flag.contentType}
      </span>
      {href ? (
        <Link to={href} className="text-accent hover:underline">
          {label}
        </Link>
      ) : (
        <span title="The case is no longer there">{label}</span>
      )}
    </span>
  );
}

export function FlagQueue({ status }: { status: FlagStatus }) {
  const { data } = useFlags(status);
  const [resolving, setResolving] = useState<CaseFlag | null>(null);
  const { flags } = data;
  const open = status === 'open';

  return (
    <section aria-labelledby="flags-title" className="rounded-lg border border-line bg-surface">
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="flags-title" className="text-sm font-semibold">
          {open ? 'Open reports' : 'Resolved reports'}
        </h2>
        <span className="text-xs text-ink-muted">
          {formatCount(flags.length)} {flags.length === 1 ? 'report' : 'reports'}
          {open ? ', the longest waiting first' : ''}
        </span>
      </header>
      {flags.length === 0 ? (
        <p className="px-4 py-8 text-center text-sm text-ink-muted">
          {open
            ? 'Nothing waits for a moderator. Reports members send about cases and comments appear here.'
            : 'No report has been resolved yet.'}
        </p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[52rem] border-collapse text-[13px]">
            <thead className="border-b border-line bg-raised/60">
              <tr>
                <th scope="col" className={headClass}>
                  What
                </th>
                <th scope="col" className={headClass}>
                  Why it was reported
                </th>
                <th scope="col" className={headClass}>
                  Reported by
                </th>
                <th scope="col" className={headClass}>
                  When
                </th>
                {open ? (
                  <th scope="col" className={headClass}>
                    <span className="sr-only">Actions</span>
                  </th>
                ) : (
                  <th scope="col" className={headClass}>
                    Resolved
                  </th>
                )}
              </tr>
            </thead>
            <tbody>
              {flags.map((flag) => (
                <tr key={flag.id} className="border-b border-line/70 last:border-b-0">
                  <td className={cellClass}>
                    <FlaggedContent flag={flag} />
                  </td>
                  <td className={`${cellClass} max-w-[24rem] whitespace-pre-line`}>
                    {flag.reason}
                  </td>
                  <td className={`${cellClass} whitespace-nowrap`}>
                    <Person person={flag.flagger} />
                  </td>
                  <td className={`${cellClass} whitespace-nowrap`}>
                    <Moment at={flag.createdAt} />
                  </td>
                  {open ? (
                    <td className={`${cellClass} text-right`}>
                      <Button size="sm" onClick={() => setResolving(flag)}>
                        Resolve…
                      </Button>
                    </td>
                  ) : (
                    <td className={`${cellClass} max-w-[22rem]`}>
                      <div className="flex flex-wrap items-baseline gap-x-2">
                        {flag.resolver && <Person person={flag.resolver} />}
                        <Moment at={flag.resolvedAt} />
                      </div>
                      {flag.resolution && (
                        <p className="mt-0.5 whitespace-pre-line text-ink-muted">
                          {flag.resolution}
                        </p>
                      )}
                    </td>
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <ResolveFlagDialog flag={resolving} onClose={() => setResolving(null)} />
    </section>
  );
}
