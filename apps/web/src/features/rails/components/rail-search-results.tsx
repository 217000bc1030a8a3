import type { RailSearchResponse } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { NetKindBadge } from '../../../components/ui/net-kind-badge';
import { paths } from '../../../config/paths';
import { formatCount, formatVolts } from '../../../lib/quantity-format';

/** Rails found on every board, one block per board in the order of its best match. */
export function RailSearchResults({ response }: { response: RailSearchResponse }) {
  if (response.groups.length === 0) {
    return (
      <p className="rounded-lg border border-dashed border-line-strong bg-surface px-6 py-8 text-center text-sm text-ink-muted">
        No rail on any board looks like <span className="font-mono text-ink">{response.query}</span>
        .
      </p>
    );
  }
  return (
    <div className="space-y-3">
      {response.groups.map((group) => (
        <section
          key={group.board.slug}
          aria-labelledby={`board-${group.board.slug}`}
          className="overflow-hidden rounded-lg border border-line bg-surface"
        >
          <header className="flex items-baseline gap-3 border-b border-line bg-raised/60 px-3 py-2">
            <h2 id={`board-${group.board.slug}`} className="text-sm font-semibold">
              <Link
                to={paths.board.getHref(group.board.slug)}
                className="text-ink hover:text-accent hover:underline"
              >
                {group.board.title}
              </Link>
            </h2>
            <span className="font-mono text-xs text-ink-faint">{group.board.slug}</span>
            <span className="ml-auto text-xs text-ink-muted">
              {formatCount(group.nets.length)} {group.nets.length === 1 ? 'rail' : 'rails'}
            </span>
          </header>
          <ul>
            {group.nets.map((net) => (
              <li key={net.name} className="border-b border-line/70 last:border-b-0">
                <Link
                  to={paths.net.getHref(group.board.slug, net.name)}
                  className="grid grid-cols-[minmax(0,16rem)_auto_5.5rem_minmax(0,1fr)] items-center gap-x-3 px-3 py-1.5 text-[13px] hover:bg-select"
                >
                  <span className="truncate font-mono font-medium text-ink">{net.name}</span>
                  <NetKindBadge kind={net.kind} />
                  <span className="text-right font-mono text-xs text-ink-muted tabular">
                    {formatVolts(net.nominalVoltage)}
                  </span>
                  <span className="truncate text-xs text-ink-muted">
                    {net.matchedAlias && (
                      <>
                        alias <span className="font-mono text-ink">{net.matchedAlias}</span>
                      </>
                    )}
                  </span>
                </Link>
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
