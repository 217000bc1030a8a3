import type { PowerEdge } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { linkKindHint, linkKindLabel, PowerLinkGlyph } from './power-link-glyph';

function LinkList({
  slug,
  links,
  far,
  empty,
}: {
  slug: string;
  links: PowerEdge[];
  far: 'from' | 'to';
  empty: string;
}) {
  if (links.length === 0) return <p className="text-[13px] text-ink-muted">{empty}</p>;
  return (
    <ul className="space-y-0.5">
      {links.map((link) => (
        <li
          key={`${link.from}>${link.to}:${link.via}`}
          className="grid grid-cols-[1.5rem_minmax(0,1fr)_auto] items-center gap-2 text-[13px]"
        >
          <span title={`${linkKindLabel[link.kind]}: ${linkKindHint[link.kind]}`}>
            <PowerLinkGlyph kind={link.kind} width={22} />
          </span>
          <Link
            to={paths.net.getHref(slug, link[far])}
            className="truncate font-mono text-ink hover:text-accent hover:underline"
          >
            {link[far]}
          </Link>
          <span
            className="font-mono text-xs text-ink-muted"
            title={
              link.origin === 'entered' ? 'entered in the annotations' : 'derived from the netlist'
            }
          >
            {link.via}
            <span className="ml-1.5 font-sans">{link.viaKind ?? 'part not in the netlist'}</span>
          </span>
        </li>
      ))}
    </ul>
  );
}

type PowerLinksPanelProps = { slug: string; linksIn: PowerEdge[]; linksOut: PowerEdge[] };

export function PowerLinksPanel({ slug, linksIn, linksOut }: PowerLinksPanelProps) {
  const heading = 'text-[11px] font-medium tracking-wider text-ink-faint uppercase';
  return (
    <section
      aria-labelledby="power-links-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="border-b border-line px-3 py-2">
        <h2 id="power-links-title" className="text-sm font-semibold">
          Power links
        </h2>
      </header>
      <div className="space-y-3 px-3 py-2.5">
        <div>
          <h3 className={heading}>Fed from</h3>
          <div className="mt-1">
            <LinkList slug={slug} links={linksIn} far="from" empty="No link feeds this net." />
          </div>
        </div>
        <div>
          <h3 className={heading}>Feeds</h3>
          <div className="mt-1">
            <LinkList slug={slug} links={linksOut} far="to" empty="This net feeds no other." />
          </div>
        </div>
      </div>
    </section>
  );
}
