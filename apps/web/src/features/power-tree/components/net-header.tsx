import type { NetDetail } from '@railyard/shared';
import type { ReactNode } from 'react';
import { BoardItemHeader } from '../../../components/layout/board-item-header';
import { Counted } from '../../../components/ui/count';
import { NetKindBadge } from '../../../components/ui/net-kind-badge';
import { formatVolts } from '../../../lib/quantity-format';
import { UpstreamPathNav } from './upstream-path';

type NetHeaderProps = {
  board: { slug: string; title: string };
  detail: NetDetail;
  /** the rail search box, placed at the top right */
  search?: ReactNode;
};

export function NetHeader({ board, detail, search }: NetHeaderProps) {
  const { net } = detail;
  return (
    <BoardItemHeader
      titleId="net-title"
      board={board}
      kind="net"
      name={net.name}
      aside={search}
      facts={
        <>
          <NetKindBadge kind={net.kind} />
          {net.nominalVoltage !== null && (
            <span className="font-mono text-ink">{formatVolts(net.nominalVoltage)}</span>
          )}
          {detail.isRoot && (
            <span className="inline-flex h-5 items-center rounded border border-lamp/40 px-1.5 text-[11.5px] font-medium text-lamp">
              root
            </span>
          )}
          <Counted value={net.componentCount} one="component" many="components" />
          <Counted value={net.pinCount} one="pin" many="pins" />
          {net.aliases.length > 0 && (
            <span>
              also <span className="font-mono text-ink">{net.aliases.join(', ')}</span>
            </span>
          )}
        </>
      }
      footer={
        <div className="mt-3 flex items-baseline gap-3">
          <span className="shrink-0 text-[11px] font-medium tracking-wider text-ink-faint uppercase">
            From the root
          </span>
          <UpstreamPathNav
            slug={board.slug}
            net={net.name}
            rootNet={detail.rootNet}
            isRoot={detail.isRoot}
            paths={detail.upstreamPaths}
          />
        </div>
      }
    >
      {net.description && (
        <p className="mt-1.5 max-w-4xl text-[13px] text-ink-muted">{net.description}</p>
      )}
    </BoardItemHeader>
  );
}
