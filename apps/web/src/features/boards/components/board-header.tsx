import type { BoardDetail } from '@railyard/shared';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { LinkButton } from '../../../components/ui/button';
import {
  NetKindGlyph,
  netKindLabel,
  netKindOrder,
  netKindTone,
} from '../../../components/ui/net-kind-badge';
import { Count } from '../../../components/ui/count';
import { paths } from '../../../config/paths';
import { naturalCompare } from '../../../lib/natural-order';
import { formatCount, formatVolts } from '../../../lib/quantity-format';

const labelClass = 'text-[11px] font-medium tracking-wider text-ink-faint uppercase';

function Fact({ label, children, mono }: { label: string; children: ReactNode; mono?: boolean }) {
  return (
    <div className="min-w-0">
      <dt className={labelClass}>{label}</dt>
      <dd className={`mt-0.5 truncate ${mono ? 'font-mono text-[13px]' : 'text-sm'}`}>
        {children}
      </dd>
    </div>
  );
}

function Total({ label, value }: { label: string; value: number }) {
  return (
    <div>
      <dt className={labelClass}>{label}</dt>
      <dd className="font-mono text-base leading-6 font-medium tabular">{formatCount(value)}</dd>
    </div>
  );
}

const blank = <span className="text-ink-faint">—</span>;

type BoardHeaderProps = {
  board: BoardDetail;
  /** the rail search box, placed at the top right */
  search?: ReactNode;
  /** whether the viewer may import (admins): only then is "Re-import" offered */
  canImport?: boolean;
};

export function BoardHeader({ board, search, canImport = false }: BoardHeaderProps) {
  const componentKinds = Object.entries(board.componentKindCounts)
    .filter(([, count]) => count > 0)
    .sort(([a, countA], [b, countB]) => countB - countA || naturalCompare(a, b));

  return (
    <section aria-labelledby="board-title" className="border-b border-line bg-surface px-4 py-3">
      <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
        <div className="min-w-0 flex-1">
          <h1 id="board-title" className="text-lg leading-tight font-semibold">
            {board.title}
          </h1>
          <p className="mt-0.5 font-mono text-xs text-ink-faint">{board.slug}</p>
        </div>
        {search}
        <LinkButton size="sm" to={paths.boardCases.getHref(board.slug)}>
          Cases
        </LinkButton>
        {canImport && (
          <LinkButton size="sm" to={paths.boardImport.getHref(board.slug)}>
            Re-import netlist
          </LinkButton>
        )}
      </div>

      <div className="mt-3 flex flex-wrap items-end gap-x-10 gap-y-3">
        <dl className="flex flex-wrap gap-x-8 gap-y-2">
          <Fact label="Device family">{board.deviceFamily || blank}</Fact>
          <Fact label="Board number" mono>
            {board.boardNumber || blank}
          </Fact>
          <Fact label="Revision" mono>
            {board.revision || blank}
          </Fact>
          <Fact label="Battery" mono>
            {board.batteryVoltage === null ? blank : formatVolts(board.batteryVoltage)}
          </Fact>
          <Fact label="Root net" mono>
            {board.rootNet ? (
              <Link
                to={paths.net.getHref(board.slug, board.rootNet)}
                className="hover:text-accent hover:underline"
              >
                {board.rootNet}
              </Link>
            ) : (
              blank
            )}
          </Fact>
        </dl>
        <dl className="flex flex-wrap gap-x-8 gap-y-2">
          <Total label="Nets" value={board.netCount} />
          <Total label="Components" value={board.componentCount} />
          <Total label="Pins" value={board.pinCount} />
          <Total label="Power links" value={board.powerLinkCount} />
        </dl>
      </div>

      <div className="mt-3 grid grid-cols-[5.5rem_minmax(0,1fr)] items-center gap-x-3 gap-y-1.5 text-[13px]">
        <span className={labelClass}>Net kinds</span>
        <ul className="flex flex-wrap gap-1.5">
          {netKindOrder.map((kind) => (
            <li
              key={kind}
              className={`inline-flex h-5.5 items-center gap-1.5 rounded border px-1.5 ${netKindTone[kind]}`}
            >
              <NetKindGlyph kind={kind} size={11} />
              <span>{netKindLabel[kind]}</span>
              <span className="font-mono tabular">
                {formatCount(board.netKindCounts[kind] ?? 0)}
              </span>
            </li>
          ))}
        </ul>
        <span className={labelClass}>Parts</span>
        <ul className="flex flex-wrap gap-x-3.5 gap-y-0.5 text-ink-muted">
          {componentKinds.map(([kind, count]) => (
            <li key={kind}>
              {kind} <Count value={count} />
            </li>
          ))}
          {componentKinds.length === 0 && <li>{blank}</li>}
        </ul>
      </div>

      {board.notes && (
        <p className="mt-2.5 max-w-4xl text-[13px] whitespace-pre-line text-ink-muted">
          {board.notes}
        </p>
      )}
    </section>
  );
}
