// The way power takes from the board's root to this rail, as breadcrumbs: each rail a link,
// each step the part it passes through. A rail fed more than one way lists the others folded.
import type { UpstreamPath } from '@railyard/shared';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { linkKindLabel, PowerLinkGlyph } from './power-link-glyph';

function PathSteps({ slug, path, current }: { slug: string; path: UpstreamPath; current: string }) {
  return (
    <ol className="flex flex-wrap items-center gap-x-1.5 gap-y-1">
      {path.map((step, i) => (
        <Fragment key={`${i}:${step.net}`}>
          {step.kind && (
            <li
              aria-label={`through ${step.via ?? 'an unknown part'}, ${linkKindLabel[step.kind]}`}
              className="inline-flex items-center gap-1 text-xs text-ink-muted"
            >
              <PowerLinkGlyph kind={step.kind} width={22} />
              {step.via && <code className="text-ink-muted">{step.via}</code>}
            </li>
          )}
          <li>
            {step.net === current ? (
              <span aria-current="page" className="font-mono text-[13px] font-semibold text-lamp">
                {step.net}
              </span>
            ) : (
              <Link
                to={paths.net.getHref(slug, step.net)}
                className="font-mono text-[13px] text-ink hover:text-accent hover:underline"
              >
                {step.net}
              </Link>
            )}
          </li>
        </Fragment>
      ))}
    </ol>
  );
}

type UpstreamPathNavProps = {
  slug: string;
  net: string;
  rootNet: string | null;
  isRoot: boolean;
  paths: UpstreamPath[];
};

export function UpstreamPathNav({ slug, net, rootNet, isRoot, paths: ways }: UpstreamPathNavProps) {
  const [first, ...others] = ways;
  if (!first) {
    const text = isRoot
      ? 'This is the board’s root rail: power enters the board here.'
      : rootNet
        ? `No power link leads here from the root, ${rootNet}.`
        : 'The board has no root net set, so there is no way from the root to show.';
    return <p className="text-[13px] text-ink-muted">{text}</p>;
  }
  return (
    <nav aria-label={`Way from the root to ${net}`} className="min-w-0">
      <PathSteps slug={slug} path={first} current={net} />
      {others.length > 0 && (
        <details className="group mt-1">
          <summary className="cursor-pointer text-xs text-ink-muted select-none hover:text-ink">
            {others.length === 1 ? '1 other way' : `${others.length} other ways`} from the root
          </summary>
          <ul className="mt-1 space-y-1 border-l border-line pl-3">
            {others.map((way, i) => (
              <li key={i}>
                <PathSteps slug={slug} path={way} current={net} />
              </li>
            ))}
          </ul>
        </details>
      )}
    </nav>
  );
}
