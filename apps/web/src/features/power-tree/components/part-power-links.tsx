// Where a part sits in the board's power tree: the links it is the converter, switch or series part
// of, each leading to the rails on both sides. A switch gets the trade's warning about heat.
import type { ComponentDetail } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { linkKindHint, linkKindLabel, PowerLinkGlyph } from './power-link-glyph';

export function PartPowerLinks({
  slug,
  refdes,
  links,
}: {
  slug: string;
  refdes: string;
  links: ComponentDetail['powerLinks'];
}) {
  const switches = links.filter((link) => link.kind === 'switch');
  return (
    <section
      aria-labelledby="part-power-links-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex flex-wrap items-baseline gap-x-3 border-b border-line px-3 py-2">
        <h2 id="part-power-links-title" className="text-sm font-semibold">
          In the power tree
        </h2>
        <span className="text-xs text-ink-muted">
          {links.length === 0
            ? 'no power link passes through it'
            : `${links.length} ${links.length === 1 ? 'link' : 'links'} through ${refdes}`}
        </span>
      </header>
      {links.length > 0 && (
        <ul aria-label={`Power links through ${refdes}`} className="divide-y divide-line/60">
          {links.map((link) => (
            <li
              key={`${link.from}→${link.to}`}
              className="flex flex-wrap items-center gap-x-2 gap-y-0.5 px-3 py-1.5 text-[13px]"
            >
              <Link to={paths.net.getHref(slug, link.from)} className="font-mono hover:text-accent">
                {link.from}
              </Link>
              <PowerLinkGlyph kind={link.kind} />
              <Link to={paths.net.getHref(slug, link.to)} className="font-mono hover:text-accent">
                {link.to}
              </Link>
              <span className="text-xs text-ink-muted" title={linkKindHint[link.kind]}>
                {linkKindLabel[link.kind]}
                {link.origin === 'derived' ? ', from the netlist' : ''}
              </span>
            </li>
          ))}
        </ul>
      )}
      {switches.length > 0 && (
        <p className="border-t border-line px-3 py-2 text-xs leading-snug text-ink-muted">
          Injecting into {switches.map((link) => link.to).join(' or ')}, this switch may warm first
          without being the faulty part: a short further down the line draws its current through it.
          Look along the rail it feeds before replacing it (common practice).
        </p>
      )}
    </section>
  );
}
