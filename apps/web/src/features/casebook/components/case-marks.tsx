// Small marks the case list, the rail panel and the case page share: the score at a glance, and
// chips for nets and culprit parts.
import type { CaseScore } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { StrokeGlyph } from '../../../components/ui/glyph';
import { paths } from '../../../config/paths';
import { formatCount } from '../../../lib/quantity-format';

export function UpGlyph({ size = 10 }: { size?: number }) {
  return (
    <svg viewBox="0 0 10 10" width={size} height={size} aria-hidden="true" className="shrink-0">
      <path d="M5 1.5 9 7.5H1Z" fill="currentColor" />
    </svg>
  );
}

export function DownGlyph({ size = 10 }: { size?: number }) {
  return (
    <svg viewBox="0 0 10 10" width={size} height={size} aria-hidden="true" className="shrink-0">
      <path d="M5 8.5 1 2.5h8Z" fill="currentColor" />
    </svg>
  );
}

export function ConfirmGlyph({ size = 11 }: { size?: number }) {
  return (
    <StrokeGlyph size={size}>
      <rect x="1.5" y="1.5" width="9" height="9" rx="2" />
      <path d="M3.8 6.2 5.4 7.8 8.4 4.4" />
    </StrokeGlyph>
  );
}

/** "▲3 ▼1 ☑2", with the words for a screen reader. */
export function ScoreLine({ score, className }: { score: CaseScore; className?: string }) {
  const label = `${score.ups} up, ${score.downs} down, ${score.confirmations} confirmed it worked`;
  return (
    <span
      aria-label={label}
      title={label}
      className={`inline-flex items-center gap-2.5 font-mono text-xs tabular ${className ?? ''}`}
    >
      <span
        className={`inline-flex items-center gap-1 ${score.ups > 0 ? 'text-ink' : 'text-ink-faint'}`}
      >
        <UpGlyph />
        {formatCount(score.ups)}
      </span>
      <span
        className={`inline-flex items-center gap-1 ${score.downs > 0 ? 'text-ink' : 'text-ink-faint'}`}
      >
        <DownGlyph />
        {formatCount(score.downs)}
      </span>
      <span
        className={`inline-flex items-center gap-1 ${score.confirmations > 0 ? 'text-ok' : 'text-ink-faint'}`}
      >
        <ConfirmGlyph />
        {formatCount(score.confirmations)}
      </span>
    </span>
  );
}

const chip =
  'inline-flex h-5 max-w-full items-center gap-1 rounded border px-1.5 font-mono text-[11.5px] leading-none';

/** A net the case names, leading to the net's page. */
export function NetChip({ slug, net }: { slug: string; net: string }) {
  return (
    <Link
      to={paths.net.getHref(slug, net)}
      className={`${chip} truncate border-line text-ink-muted hover:border-accent/60 hover:text-accent`}
    >
      {net}
    </Link>
  );
}

/** The part that was at fault: marked by a word-like glyph as well as the tone. */
export function CulpritChip({ refdes, title }: { refdes: string; title?: string }) {
  return (
    <span
      title={title ?? `${refdes} was the culprit`}
      className={`${chip} border-danger/45 bg-danger-soft font-medium text-danger`}
    >
      <CulpritGlyph />
      {refdes}
    </span>
  );
}

/** A crossed part outline: "this part was at fault". */
export function CulpritGlyph({ size = 10 }: { size?: number }) {
  return (
    <StrokeGlyph size={size} strokeWidth={1.7}>
      <rect x="1.2" y="3" width="9.6" height="6" rx="1.2" />
      <path d="M3 1.2 9 10.8" />
    </StrokeGlyph>
  );
}

/** Whoever wrote something: their name when they gave one, else their login. */
export function PersonName({ person }: { person: { login: string; name: string } }) {
  if (person.name) {
    return (
      <span title={person.login} className="text-ink">
        {person.name}
      </span>
    );
  }
  return <span className="font-mono text-ink">{person.login}</span>;
}
