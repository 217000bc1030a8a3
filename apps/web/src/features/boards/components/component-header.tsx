// The top of a part's page: what the part is, where it sits, and what the casebook says about it.
import type { ComponentDetail, ComponentKind } from '@railyard/shared';
import type { ReactNode } from 'react';
import { BoardItemHeader } from '../../../components/layout/board-item-header';
import { Count } from '../../../components/ui/count';
import { formatCount, formatVolts } from '../../../lib/quantity-format';

export function ComponentKindBadge({ kind }: { kind: ComponentKind }) {
  return (
    <span className="inline-flex h-5 items-center rounded border border-line-strong bg-raised px-1.5 text-[11.5px] leading-none font-medium text-ink">
      {kind}
    </span>
  );
}

function plural(count: number, one: string, many: string) {
  return `${formatCount(count)} ${count === 1 ? one : many}`;
}

/** "Named in 3 published cases · the culprit in 1 solved case". */
export function CulpritTallyLine({ casebook }: { casebook: ComponentDetail['casebook'] }) {
  // the page's case list says so when there are none
  if (casebook.cases === 0 && casebook.solvedAsCulprit === 0) return null;
  const { cases, solvedAsCulprit } = casebook;
  return (
    <p className="text-[13px] text-ink-muted">
      Named in <Count value={cases} /> published {cases === 1 ? 'case' : 'cases'}
      <span className="mx-1.5 text-ink-faint" aria-hidden="true">
        ·
      </span>
      {solvedAsCulprit === 0 ? (
        'never the culprit in a solved one'
      ) : (
        <>
          the culprit in{' '}
          <span className="font-mono font-medium text-danger tabular">
            {formatCount(solvedAsCulprit)}
          </span>{' '}
          solved {solvedAsCulprit === 1 ? 'case' : 'cases'}
        </>
      )}
    </p>
  );
}

type ComponentHeaderProps = {
  board: { slug: string; title: string };
  detail: ComponentDetail;
  /** what a visitor can do from here (write up a case), at the top right */
  actions?: ReactNode;
};

export function ComponentHeader({ board, detail, actions }: ComponentHeaderProps) {
  const { component } = detail;
  const facts = [
    component.package,
    component.side === null ? '' : `${component.side} side`,
    component.ratedVoltage === null ? '' : `rated ${formatVolts(component.ratedVoltage)}`,
  ].filter((fact) => fact !== '');
  return (
    <BoardItemHeader
      titleId="component-title"
      board={board}
      kind="part"
      name={component.refdes}
      aside={actions}
      facts={
        <>
          <ComponentKindBadge kind={component.kind} />
          {component.value ? (
            <span className="font-mono text-ink" title="Value as written in the parts list">
              {component.value}
            </span>
          ) : (
            <span className="text-ink-faint">no value given</span>
          )}
          {facts.map((fact) => (
            <span key={fact}>{fact}</span>
          ))}
          <span>{plural(component.pins.length, 'pin', 'pins')}</span>
        </>
      }
    >
      <div className="mt-1.5 empty:hidden">
        <CulpritTallyLine casebook={detail.casebook} />
      </div>
    </BoardItemHeader>
  );
}
