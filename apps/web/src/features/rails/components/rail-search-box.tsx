// "Find a rail" on a board's pages: a combobox over the board's nets and aliases, forgiving of
// case, separators and a slip of the finger. "/" jumps here, the arrows move, Enter opens the
// net's page, Esc closes. The last option hands the text to the search over all boards.
import type { NetRow } from '@railyard/shared';
import {
  useDeferredValue,
  useEffect,
  useId,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent,
} from 'react';
import { useNavigate } from 'react-router-dom';
import { controlClass } from '../../../components/ui/field';
import { Kbd } from '../../../components/ui/kbd';
import { NetKindBadge } from '../../../components/ui/net-kind-badge';
import { paths } from '../../../config/paths';
import { formatVolts } from '../../../lib/quantity-format';
import type { RailIndex, RailMatch } from '../rail-index';

const shownMatches = 8;

function typingInto(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

type RailSearchBoxProps = {
  slug: string;
  /** the board's nets; undefined while they load */
  nets: readonly NetRow[] | undefined;
  className?: string;
};

export function RailSearchBox({ slug, nets, className }: RailSearchBoxProps) {
  const navigate = useNavigate();
  const id = useId();
  const listId = `${id}-list`;
  const optionId = (index: number) => `${id}-option-${index}`;
  const input = useRef<HTMLInputElement>(null);
  const list = useRef<HTMLUListElement>(null);

  const [text, setText] = useState('');
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  // The search code and the index arrive on first use, not with the page: most visits never
  // search, and a board page with thousands of nets has enough to do on its first paint.
  const [armed, setArmed] = useState(false);
  const [build, setBuild] = useState<((nets: readonly NetRow[]) => RailIndex) | null>(null);
  useEffect(() => {
    if (!armed || build) return;
    let live = true;
    void import('../rail-index').then((module) => {
      if (live) setBuild(() => module.buildRailIndex);
    });
    return () => {
      live = false;
    };
  }, [armed, build]);
  const index = useMemo(() => (build && nets ? build(nets) : null), [build, nets]);
  // Typing stays responsive; the list catches up a frame later on a big board.
  const query = useDeferredValue(text);
  const matches: RailMatch[] = useMemo(
    () => (index ? index.search(query, shownMatches) : []),
    [index, query],
  );
  const trimmed = text.trim();
  const optionCount = trimmed ? matches.length + 1 : 0;
  const expanded = open && trimmed !== '';
  // The list can shrink a frame after the text changed (deferred); the highlight stays on it.
  const current = Math.min(active, Math.max(0, optionCount - 1));

  useEffect(() => {
    const onKey = (event: globalThis.KeyboardEvent) => {
      if (event.key !== '/' || event.ctrlKey || event.metaKey || event.altKey) return;
      if (typingInto(event.target)) return;
      event.preventDefault();
      setArmed(true);
      input.current?.focus();
      input.current?.select();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);

  useEffect(() => {
    if (!expanded) return;
    list.current?.children
      .namedItem(`${id}-option-${current}`)
      ?.scrollIntoView({ block: 'nearest' });
  }, [id, current, expanded]);

  const finish = () => {
    setText('');
    setOpen(false);
    input.current?.blur();
  };

  const choose = (index: number) => {
    const match = matches[index];
    if (match) {
      void navigate(paths.net.getHref(slug, match.net.name));
      finish();
    } else if (trimmed) {
      void navigate(paths.search.getHref(trimmed));
      finish();
    }
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    switch (event.key) {
      case 'ArrowDown':
      case 'ArrowUp': {
        if (optionCount === 0) return;
        event.preventDefault();
        if (!open) {
          setOpen(true);
          return;
        }
        const step = event.key === 'ArrowDown' ? 1 : -1;
        setActive((current + step + optionCount) % optionCount);
        return;
      }
      case 'Home':
      case 'End':
        if (!expanded) return;
        event.preventDefault();
        setActive(event.key === 'Home' ? 0 : optionCount - 1);
        return;
      case 'Enter':
        if (!trimmed) return;
        event.preventDefault();
        choose(expanded ? current : 0);
        return;
      case 'Escape':
        // Handled here: the page's own Esc (closing a side panel) must not fire as well.
        event.preventDefault();
        event.stopPropagation();
        if (expanded) setOpen(false);
        else if (text) setText('');
        else event.currentTarget.blur();
        return;
    }
  };

  return (
    <div
      className={`relative w-80 max-w-full ${className ?? ''}`}
      onBlur={(event) => {
        if (!event.currentTarget.contains(event.relatedTarget)) setOpen(false);
      }}
    >
      <label htmlFor={`${id}-input`} className="sr-only">
        Find a rail on this board
      </label>
      <input
        ref={input}
        id={`${id}-input`}
        type="text"
        role="combobox"
        aria-expanded={expanded}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={expanded ? optionId(current) : undefined}
        autoComplete="off"
        spellCheck={false}
        maxLength={100}
        placeholder="Find a rail, e.g. 3v3"
        value={text}
        onFocus={() => {
          setArmed(true);
          setOpen(true);
        }}
        onChange={(event) => {
          setText(event.target.value);
          setActive(0);
          setOpen(true);
        }}
        onKeyDown={onKeyDown}
        className={`${controlClass} h-8 pr-8 font-mono text-[13px]`}
      />
      <span className="pointer-events-none absolute top-1/2 right-2 -translate-y-1/2">
        <Kbd>/</Kbd>
      </span>
      <p className="sr-only" aria-live="polite">
        {expanded ? `${matches.length} ${matches.length === 1 ? 'rail' : 'rails'} found` : ''}
      </p>
      <ul
        ref={list}
        id={listId}
        role="listbox"
        aria-label="Rails on this board"
        hidden={!expanded}
        className="absolute top-full right-0 z-40 mt-1 max-h-[min(26rem,70vh)] w-[26rem] max-w-[calc(100vw-2rem)] overflow-auto rounded-md border border-line-strong bg-surface py-1 shadow-lg shadow-black/30"
      >
        {expanded && !index && (
          <li role="presentation" className="px-3 py-2 text-[13px] text-ink-muted">
            Loading the search…
          </li>
        )}
        {expanded && index && matches.length === 0 && (
          <li role="presentation" className="px-3 py-2 text-[13px] text-ink-muted">
            No net on this board looks like <span className="font-mono text-ink">{trimmed}</span>.
          </li>
        )}
        {expanded &&
          matches.map((match, i) => (
            <li
              key={match.net.name}
              id={optionId(i)}
              role="option"
              aria-selected={i === current}
              onMouseDown={(event) => event.preventDefault()}
              onMouseMove={() => setActive(i)}
              onClick={() => choose(i)}
              className={`grid cursor-pointer grid-cols-[minmax(0,1fr)_auto_4.75rem] items-center gap-x-2 px-3 py-1.5 ${
                i === current ? 'bg-select shadow-[inset_3px_0_0_var(--ry-accent)]' : ''
              }`}
            >
              <span className="truncate font-mono text-[13px] font-medium" title={match.net.name}>
                {match.net.name}
              </span>
              <NetKindBadge kind={match.net.kind} />
              <span className="text-right font-mono text-xs text-ink-muted tabular">
                {formatVolts(match.net.nominalVoltage)}
              </span>
              {match.matchedAlias && (
                <span className="col-span-3 truncate text-xs text-ink-muted">
                  alias <span className="font-mono text-ink">{match.matchedAlias}</span>
                </span>
              )}
            </li>
          ))}
        {expanded && (
          <li
            id={optionId(matches.length)}
            role="option"
            aria-selected={current === matches.length}
            onMouseDown={(event) => event.preventDefault()}
            onMouseMove={() => setActive(matches.length)}
            onClick={() => choose(matches.length)}
            className={`mt-1 cursor-pointer border-t border-line px-3 py-1.5 text-[13px] text-ink-muted ${
              current === matches.length ? 'bg-select shadow-[inset_3px_0_0_var(--ry-accent)]' : ''
            }`}
          >
            Search all boards for <span className="font-mono text-ink">{trimmed}</span>
          </li>
        )}
      </ul>
    </div>
  );
}
