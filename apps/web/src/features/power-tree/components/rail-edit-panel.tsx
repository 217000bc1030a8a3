// Moderators' tools on a rail's page: its facts, the board's root, its power links and a new link.
// Folded by default, so reading the page is not pushed down by forms; it stays open from rail to rail.
import type { NetDetail, NetRow } from '@railyard/shared';
import { useId, useState, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { AddPowerLinkForm } from './add-power-link-form';
import { RailFactsForm } from './rail-facts-form';
import { RailLinksEditor } from './rail-links-editor';
import { RootNetForm } from './root-net-form';

function Part({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="min-w-0 px-3 py-3">
      <h3 className="mb-2 text-[11px] font-medium tracking-wider text-ink-faint uppercase">
        {title}
      </h3>
      {children}
    </div>
  );
}

type RailEditPanelProps = {
  slug: string;
  detail: NetDetail;
  /** the board's nets, for the other end of a new link; undefined while they load */
  nets: readonly NetRow[] | undefined;
  /** who is editing, to tell their own entries apart */
  currentUserId: number | null;
};

export function RailEditPanel({ slug, detail, nets, currentUserId }: RailEditPanelProps) {
  const [open, setOpen] = useState(false);
  const id = useId();
  const net = detail.net;
  return (
    <section
      aria-labelledby={`${id}-title`}
      className="rounded-md border border-accent/35 bg-surface"
    >
      <header className="flex items-center gap-2 px-3 py-2">
        <h2 id={`${id}-title`} className="text-sm font-semibold">
          Edit
        </h2>
        <span className="truncate text-xs text-ink-muted">
          facts, root and power links of <span className="font-mono">{net.name}</span>
        </span>
        <Button
          size="sm"
          variant={open ? 'ghost' : 'secondary'}
          aria-expanded={open}
          aria-controls={open ? `${id}-body` : undefined}
          onClick={() => setOpen((current) => !current)}
          className="ml-auto shrink-0"
        >
          {open ? 'Close' : 'Edit this rail'}
        </Button>
      </header>
      {open && (
        // Keyed by rail: the forms start from the facts of the rail now shown.
        <div
          id={`${id}-body`}
          key={net.name}
          className="grid divide-y divide-line border-t border-line lg:grid-cols-3 lg:divide-x lg:divide-y-0"
        >
          <div className="min-w-0 divide-y divide-line">
            <Part title="Rail">
              <RailFactsForm slug={slug} net={net} />
            </Part>
            <Part title="Board root">
              <RootNetForm slug={slug} net={net} isRoot={detail.isRoot} rootNet={detail.rootNet} />
            </Part>
          </div>
          <Part title="Power links">
            <RailLinksEditor slug={slug} rail={net.name} currentUserId={currentUserId} />
          </Part>
          <Part title="Add a link">
            <AddPowerLinkForm slug={slug} rail={net.name} parts={detail.loads.parts} nets={nets} />
          </Part>
        </div>
      )}
    </section>
  );
}
