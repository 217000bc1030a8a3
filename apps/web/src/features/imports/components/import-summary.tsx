import type { ImportJob, ImportSummary as Summary } from '@railyard/shared';
import type { ReactNode } from 'react';
import { LinkButton } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { formatCount } from '../../../lib/quantity-format';

function Count({ label, value }: { label: string; value: number }) {
  return (
    <div className="rounded-md border border-line bg-sunken px-3 py-2">
      <dt className="text-xs text-ink-muted">{label}</dt>
      <dd className="font-mono text-lg font-medium tabular">{formatCount(value)}</dd>
    </div>
  );
}

function NameList({ names, empty }: { names: string[]; empty: ReactNode }) {
  if (names.length === 0) return <span className="text-ink-faint">{empty}</span>;
  return (
    <ul className="flex flex-wrap gap-1.5">
      {names.map((name) => (
        <li
          key={name}
          className="rounded border border-line bg-raised px-1.5 py-px font-mono text-xs"
        >
          {name}
        </li>
      ))}
    </ul>
  );
}

export function ImportSummary({ job, summary }: { job: ImportJob; summary: Summary }) {
  return (
    <section
      aria-labelledby="import-done"
      className="rounded-lg border border-ok/40 bg-ok-soft p-4"
    >
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="import-done" className="text-base font-semibold text-ok">
          {summary.replaced ? 'Netlist replaced' : 'Board imported'}
        </h2>
        <span className="font-mono text-xs text-ink-muted">{job.fileName}</span>
        <LinkButton
          variant="primary"
          size="sm"
          className="ml-auto"
          to={paths.board.getHref(job.board)}
        >
          Open the board
        </LinkButton>
      </div>
      <dl className="mt-3 grid grid-cols-2 gap-2 sm:grid-cols-4">
        <Count label="Nets" value={summary.nets} />
        <Count label="Components" value={summary.components} />
        <Count label="Pins" value={summary.pins} />
        <Count label="Power links" value={summary.powerLinks} />
      </dl>
      <dl className="mt-3 grid gap-x-6 gap-y-3 text-[13px] sm:grid-cols-[9rem_1fr]">
        <dt className="text-ink-muted">Root net</dt>
        <dd className="font-mono">
          {summary.rootNet ?? <span className="text-ink-faint">none found</span>}
        </dd>
        <dt className="text-ink-muted">Ground nets</dt>
        <dd>
          <NameList names={summary.groundNets} empty="none found" />
        </dd>
        {(summary.replaced || summary.dropped.length > 0) && (
          <>
            <dt className="text-ink-muted">Dropped</dt>
            <dd>
              <NameList
                names={summary.dropped}
                empty="nothing: every annotation still has its net"
              />
            </dd>
          </>
        )}
      </dl>
    </section>
  );
}
