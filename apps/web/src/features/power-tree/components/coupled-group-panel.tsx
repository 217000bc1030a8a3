// Nets joined only by series links (inductor, ferrite, fuse, 0 Ω link) are one conductor as far
// as a short is concerned: a short anywhere in the group reads on every net of it.
import type { CoupledGroup, NetKind } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { NetKindGlyph } from '../../../components/ui/net-kind-badge';
import { paths } from '../../../config/paths';
import { formatVolts } from '../../../lib/quantity-format';
import { PowerLinkGlyph } from './power-link-glyph';

const glyphTone: Record<NetKind, string> = {
  power: 'text-power',
  ground: 'text-ground',
  signal: 'text-signal',
};

type CoupledGroupPanelProps = { slug: string; net: string; group: CoupledGroup };

export function CoupledGroupPanel({ slug, net, group }: CoupledGroupPanelProps) {
  const others = group.nets.filter((member) => member.name !== net);
  return (
    <section
      aria-labelledby="coupled-group-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="coupled-group-title" className="text-sm font-semibold">
          Coupled group
        </h2>
        <span className="text-xs text-ink-muted">
          {group.nets.length} {group.nets.length === 1 ? 'net' : 'nets'}
        </span>
      </header>
      <div className="space-y-2.5 px-3 py-2.5 text-[13px]">
        {others.length === 0 ? (
          <p className="text-ink-muted">
            No series link joins <span className="font-mono text-ink">{net}</span> to another net: a
            short read here is on this net itself.
          </p>
        ) : (
          <>
            <p className="text-ink-muted">
              Joined by series links only. A short on any of these nets reads on all of them, so
              search the whole group for it.
            </p>
            <ul className="space-y-0.5">
              {group.nets.map((member) => (
                <li
                  key={member.name}
                  className={`flex items-center gap-2 rounded px-1.5 py-0.5 ${member.name === net ? 'bg-select' : ''}`}
                >
                  <span className={glyphTone[member.kind]}>
                    <NetKindGlyph kind={member.kind} size={11} />
                  </span>
                  {member.name === net ? (
                    <span className="font-mono font-semibold text-lamp">{member.name}</span>
                  ) : (
                    <Link
                      to={paths.net.getHref(slug, member.name)}
                      className="font-mono text-ink hover:text-accent hover:underline"
                    >
                      {member.name}
                    </Link>
                  )}
                  <span className="ml-auto font-mono text-xs text-ink-muted">
                    {formatVolts(member.nominalVoltage)}
                  </span>
                </li>
              ))}
            </ul>
            <div>
              <h3 className="text-[11px] font-medium tracking-wider text-ink-faint uppercase">
                Links in the group
              </h3>
              <ul className="mt-1 space-y-0.5 font-mono text-xs">
                {group.links.map((link) => (
                  <li
                    key={`${link.from}>${link.to}:${link.via}`}
                    className="flex items-center gap-1.5"
                  >
                    <span className="truncate">{link.from}</span>
                    <PowerLinkGlyph kind={link.kind} width={20} />
                    <span className="truncate">{link.to}</span>
                    <span className="ml-auto shrink-0 text-ink-muted">
                      {link.via}
                      {link.viaKind && <span className="ml-1 font-sans">{link.viaKind}</span>}
                    </span>
                  </li>
                ))}
              </ul>
            </div>
          </>
        )}
      </div>
    </section>
  );
}
