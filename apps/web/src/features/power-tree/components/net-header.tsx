import type { NetDetail } from '@railyard/shared';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { NetKindBadge } from '../../../components/ui/net-kind-badge';
import { paths } from '../../../config/paths';
import { formatCount, formatVolts } from '../../../lib/quantity-format';
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
    <section aria-labelledby="net-title" className="border-b border-line bg-surface px-4 py-3">
      <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
        <div className="min-w-0 flex-1">
          <p className="text-[13px] text-ink-muted">
            <Link
              to={paths.board.getHref(board.slug)}
              className="hover:text-accent hover:underline"
            >
              {board.title}
            </Link>
            <span className="mx-1.5 text-ink-faint" aria-hidden="true">
              /
            </span>
            net
          </p>
          <h1
            id="net-title"
            className="mt-0.5 font-mono text-xl leading-tight font-semibold break-all"
          >
            {net.name}
          </h1>
          <div className="mt-1.5 flex flex-wrap items-center gap-x-3 gap-y-1 text-[13px] text-ink-muted">
            <NetKindBadge kind={net.kind} />
            {net.nominalVoltage !== null && (
              <span className="font-mono text-ink">{formatVolts(net.nominalVoltage)}</span>
            )}
            {detail.isRoot && (
              <span className="inline-flex h-5 items-center rounded border border-lamp/40 px-1.5 text-[11.5px] font-medium text-lamp">
                root
              </span>
            )}
            <span>
              <span className="font-mono text-ink tabular">{formatCount(net.componentCount)}</span>{' '}
              {net.componentCount === 1 ? 'component' : 'components'}
            </span>
            <span>
              <span className="font-mono text-ink tabular">{formatCount(net.pinCount)}</span>{' '}
              {net.pinCount === 1 ? 'pin' : 'pins'}
            </span>
            {net.aliases.length > 0 && (
              <span>
                also <span className="font-mono text-ink">{net.aliases.join(', ')}</span>
              </span>
            )}
          </div>
          {net.description && (
            <p className="mt-1.5 max-w-4xl text-[13px] text-ink-muted">{net.description}</p>
          )}
        </div>
        {search}
      </div>
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
    </section>
  );
}
