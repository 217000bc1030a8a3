// Every saved state of a case, newest first: who saved it, when, and each changed field before and
// after. The case's own page shows the latest; this is where an edit can be checked. A revision a
// merge wrote also keeps the duplicate's own write-up, which no longer has a page of its own.
import type { CaseRevision, CaseRevisionSnapshot } from '@railyard/shared';
import { useState } from 'react';
import { formatDateTime } from '../../../lib/date-format';
import {
  revisionChanges,
  snapshotFieldLabel,
  snapshotText,
  type FieldChange,
  type SnapshotField,
} from '../revision-changes';
import { PersonName } from './case-marks';

const fieldText =
  'min-w-0 rounded border px-2 py-1.5 font-[inherit] text-[13px] whitespace-pre-wrap break-words';

/** The duplicate's fields worth reading, in the order the case page shows them. */
const mergedFields: SnapshotField[] = [
  'title',
  'symptom',
  'readings',
  'rootCause',
  'fixSteps',
  'body',
  'outcome',
  'minutesSpent',
  'components',
  'nets',
];

function MergedCaseText({ merged }: { merged: NonNullable<CaseRevisionSnapshot['merged']> }) {
  const [open, setOpen] = useState(false);
  const title = merged.snapshot.title;
  return (
    <div className="mt-2 rounded-md border border-line bg-sunken/40">
      <button
        type="button"
        aria-expanded={open}
        onClick={() => setOpen((current) => !current)}
        className="flex w-full items-baseline gap-2 px-2.5 py-1.5 text-left text-[13px] hover:bg-raised/60"
      >
        <span aria-hidden="true" className="w-3 text-ink-faint">
          {open ? '▾' : '▸'}
        </span>
        <span>
          merged case <span className="font-mono">#{merged.caseId}</span> “{title}”
        </span>
        <span className="ml-auto text-xs text-accent">
          {open ? 'Hide its write-up' : 'Read its write-up'}
        </span>
      </button>
      {open && (
        <div className="space-y-3 border-t border-line px-2.5 pt-2 pb-3">
          <p className="text-xs text-ink-muted">
            Case #{merged.caseId} as it was when it was merged into this one.
          </p>
          {mergedFields.map((field) => {
            const text = snapshotText(merged.snapshot, field);
            return (
              <div key={field}>
                <h4 className="text-[11px] font-medium tracking-wider text-ink-faint uppercase">
                  {snapshotFieldLabel[field]}
                </h4>
                <p className={`${fieldText} mt-1 border-line bg-surface`}>
                  {text || <span className="text-ink-faint">empty</span>}
                </p>
              </div>
            );
          })}
        </div>
      )}
    </div>
  );
}

function ChangeView({ change }: { change: FieldChange }) {
  return (
    <div>
      <h4 className="text-[11px] font-medium tracking-wider text-ink-faint uppercase">
        {change.label}
      </h4>
      {change.before === null ? (
        <p className={`${fieldText} mt-1 border-line bg-sunken/50`}>
          {change.after || <span className="text-ink-faint">empty</span>}
        </p>
      ) : (
        <div className="mt-1 grid gap-2 md:grid-cols-2">
          <div className={`${fieldText} border-danger/30 bg-danger-soft/50`}>
            <span className="sr-only">Before: </span>
            {change.before || <span className="text-ink-faint">empty</span>}
          </div>
          <div className={`${fieldText} border-ok/30 bg-ok-soft/50`}>
            <span className="sr-only">After: </span>
            {change.after || <span className="text-ink-faint">empty</span>}
          </div>
        </div>
      )}
    </div>
  );
}

function RevisionItem({
  revision,
  previous,
  startOpen,
}: {
  revision: CaseRevision;
  previous: CaseRevision | undefined;
  startOpen: boolean;
}) {
  const [open, setOpen] = useState(startOpen);
  const changes = revisionChanges(revision.snapshot, previous?.snapshot ?? null, revision.changed);
  return (
    <li className="border-b border-line/70 px-3 py-2.5 last:border-b-0">
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1 text-[13px]">
        <time dateTime={revision.createdAt} className="font-mono text-ink tabular">
          {formatDateTime(revision.createdAt)}
        </time>
        <PersonName person={revision.editor} />
        <span className="text-ink-muted">{revision.summary}</span>
        {(changes.length > 0 || !previous) && (
          <button
            type="button"
            aria-expanded={open}
            onClick={() => setOpen((current) => !current)}
            className="ml-auto text-accent hover:underline"
          >
            {open ? 'Hide the changes' : previous ? 'Show the changes' : 'Show this version'}
          </button>
        )}
      </div>
      {revision.snapshot.merged && <MergedCaseText merged={revision.snapshot.merged} />}
      {open && (
        <div className="mt-2.5 space-y-3">
          {!previous && (
            <p className="text-xs text-ink-muted">
              The first version: every field as it was written.
            </p>
          )}
          {changes.map((change) => (
            <ChangeView key={change.field} change={change} />
          ))}
        </div>
      )}
    </li>
  );
}

/** `revisions` newest first, as the API lists them. */
export function CaseHistory({ revisions }: { revisions: readonly CaseRevision[] }) {
  return (
    <section aria-label="Revisions" className="rounded-md border border-line bg-surface">
      <ol>
        {revisions.map((revision, index) => (
          <RevisionItem
            key={revision.id}
            revision={revision}
            previous={revisions[index + 1]}
            startOpen={index === 0 && revisions.length > 1}
          />
        ))}
      </ol>
    </section>
  );
}
