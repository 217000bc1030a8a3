// The top of a page about one thing on a board (a part, a net): the board it belongs to, its name
// as printed on the board, a line of facts, and room at the right for what to do from here.
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';

type BoardItemHeaderProps = {
  titleId: string;
  board: { slug: string; title: string };
  /** what the thing is, after the board in the trail: "part", "net" */
  kind: string;
  name: string;
  /** the line of facts under the name */
  facts: ReactNode;
  /** more about it, under the facts */
  children?: ReactNode;
  /** at the top right */
  aside?: ReactNode;
  /** across the whole width, under the rest */
  footer?: ReactNode;
};

export function BoardItemHeader({
  titleId,
  board,
  kind,
  name,
  facts,
  children,
  aside,
  footer,
}: BoardItemHeaderProps) {
  return (
    <section aria-labelledby={titleId} className="border-b border-line bg-surface px-4 py-3">
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
            {kind}
          </p>
          <h1
            id={titleId}
            className="mt-0.5 font-mono text-xl leading-tight font-semibold break-all"
          >
            {name}
          </h1>
          <div className="mt-1.5 flex flex-wrap items-center gap-x-3 gap-y-1 text-[13px] text-ink-muted">
            {facts}
          </div>
          {children}
        </div>
        {aside}
      </div>
      {footer}
    </section>
  );
}
