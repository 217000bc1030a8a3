import type { ComponentRow, NetRow } from '@railyard/shared';
import { Suspense, useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { SectionErrorBoundary } from '../../../components/errors/error-boundary';
import { Button, LinkButton } from '../../../components/ui/button';
import { Counted } from '../../../components/ui/count';
import { Kbd } from '../../../components/ui/kbd';
import { NetKindBadge } from '../../../components/ui/net-kind-badge';
import { paths } from '../../../config/paths';
import { naturalCompare } from '../../../lib/natural-order';
import { formatCount, formatVolts } from '../../../lib/quantity-format';
import { useNetComponents } from '../api/get-net-components';

const componentsPerPage = 150;

function PinsOnNet({ component, net }: { component: ComponentRow; net: string }) {
  const pins = component.pins
    .filter((pin) => pin.net === net)
    .map((pin) => pin.pin)
    .sort(naturalCompare);
  return <>{pins.join(', ')}</>;
}

function ComponentsOnNet({ slug, net }: { slug: string; net: string }) {
  const { data } = useNetComponents(slug, net);
  const [limit, setLimit] = useState(componentsPerPage);
  // The API may answer under the net's canonical name when it was asked by an alias.
  const netName = data.net ?? net;
  const components = useMemo(
    () => [...data.components].sort((a, b) => naturalCompare(a.refdes, b.refdes)),
    [data.components],
  );
  if (components.length === 0) {
    return (
      <p className="px-3 py-6 text-center text-sm text-ink-muted">
        No component has a pin on this net.
      </p>
    );
  }
  const shown = components.slice(0, limit);
  const th = 'h-7 px-2 text-left text-xs font-medium text-ink-muted';
  const td = 'h-6.5 px-2 align-middle';
  return (
    <>
      <table className="w-full table-fixed border-collapse text-[13px]">
        <caption className="sr-only">Components with a pin on {netName}</caption>
        <colgroup>
          <col className="w-[5rem]" />
          <col className="w-[5.25rem]" />
          <col />
          <col className="w-[5.5rem]" />
          <col className="w-[3.75rem]" />
          <col className="w-[4.25rem]" />
        </colgroup>
        <thead className="sticky top-0 z-10 bg-raised shadow-[0_1px_0_var(--ry-line)]">
          <tr>
            <th scope="col" className={th}>
              Refdes
            </th>
            <th scope="col" className={th}>
              Kind
            </th>
            <th scope="col" className={th}>
              Value
            </th>
            <th scope="col" className={th}>
              Package
            </th>
            <th scope="col" className={th}>
              Side
            </th>
            <th scope="col" className={th}>
              Pins here
            </th>
          </tr>
        </thead>
        <tbody>
          {shown.map((component) => (
            <tr key={component.refdes} className="border-b border-line/70 hover:bg-raised/60">
              <td className={`${td} truncate font-mono font-medium`} title={component.refdes}>
                <Link
                  to={paths.component.getHref(slug, component.refdes)}
                  className="text-ink hover:text-accent hover:underline"
                >
                  {component.refdes}
                </Link>
              </td>
              <td className={`${td} truncate text-xs text-ink-muted`}>{component.kind}</td>
              <td className={`${td} truncate font-mono`} title={component.value || undefined}>
                {component.value}
              </td>
              <td
                className={`${td} truncate text-ink-muted`}
                title={component.package || undefined}
              >
                {component.package}
              </td>
              <td className={`${td} text-xs text-ink-muted`}>{component.side ?? ''}</td>
              <td className={`${td} truncate font-mono text-xs`}>
                <PinsOnNet component={component} net={netName} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {components.length > shown.length && (
        <div className="flex items-center gap-3 border-t border-line px-3 py-2 text-[13px] text-ink-muted">
          <span>
            {formatCount(shown.length)} of {formatCount(components.length)}
          </span>
          <Button size="sm" onClick={() => setLimit(components.length)}>
            Show all
          </Button>
        </div>
      )}
    </>
  );
}

function ComponentsLoading() {
  return (
    <div className="space-y-1.5 p-3" aria-busy="true">
      <span className="sr-only">Loading components…</span>
      {Array.from({ length: 6 }, (_, i) => (
        <div key={i} className="h-5 animate-pulse rounded bg-raised" />
      ))}
    </div>
  );
}

type PanelProps = { slug: string; net: NetRow | null; onClose: () => void };

export function NetComponentsPanel({ slug, net, onClose }: PanelProps) {
  if (!net) {
    return (
      <aside
        aria-label="Net details"
        className="rounded-md border border-dashed border-line-strong bg-surface px-4 py-8 text-center text-[13px] text-ink-muted"
      >
        <p>Pick a net to list the components on it.</p>
        <p className="mt-2 inline-flex items-center gap-1.5 text-xs text-ink-faint">
          <Kbd>↑</Kbd>
          <Kbd>↓</Kbd> walk the list, <Kbd>F</Kbd> filters, <Kbd>/</Kbd> finds a rail
        </p>
      </aside>
    );
  }
  return (
    <aside
      aria-labelledby="net-panel-title"
      className="flex max-h-[calc(100dvh-4.5rem)] flex-col overflow-hidden rounded-md border border-line bg-surface"
    >
      <header className="border-b border-line px-3 py-2.5">
        <div className="flex items-start gap-2">
          <h2
            id="net-panel-title"
            className="min-w-0 flex-1 font-mono text-[15px] font-semibold break-all"
          >
            <Link
              to={paths.net.getHref(slug, net.name)}
              className="hover:text-accent hover:underline"
            >
              {net.name}
            </Link>
          </h2>
          <LinkButton size="sm" to={paths.net.getHref(slug, net.name)}>
            Power tree and loads
          </LinkButton>
          <Button
            size="sm"
            variant="ghost"
            onClick={onClose}
            aria-label="Close net details"
            title="Close (Esc)"
          >
            ✕
          </Button>
        </div>
        <div className="mt-1.5 flex flex-wrap items-center gap-x-3 gap-y-1 text-[13px] text-ink-muted">
          <NetKindBadge kind={net.kind} />
          {net.nominalVoltage !== null && (
            <span className="font-mono text-ink">{formatVolts(net.nominalVoltage)}</span>
          )}
          <Counted value={net.componentCount} one="component" many="components" />
          <Counted value={net.pinCount} one="pin" many="pins" />
        </div>
        {net.aliases.length > 0 && (
          <p className="mt-1.5 text-xs text-ink-muted">
            also <span className="font-mono text-ink">{net.aliases.join(', ')}</span>
          </p>
        )}
        {net.description && <p className="mt-1.5 text-[13px] text-ink-muted">{net.description}</p>}
      </header>
      <div className="min-h-0 flex-1 overflow-auto">
        <SectionErrorBoundary title="Could not load the components" resetKeys={[slug, net.name]}>
          <Suspense fallback={<ComponentsLoading />}>
            <ComponentsOnNet key={net.name} slug={slug} net={net.name} />
          </Suspense>
        </SectionErrorBoundary>
      </div>
    </aside>
  );
}
