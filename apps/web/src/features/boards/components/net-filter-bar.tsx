import type { NetKind } from '@railyard/shared';
import { useEffect, useRef } from 'react';
import { Count } from '../../../components/ui/count';
import { controlClass } from '../../../components/ui/field';
import { Kbd } from '../../../components/ui/kbd';
import {
  NetKindGlyph,
  netKindLabel,
  netKindOrder,
  netKindTone,
} from '../../../components/ui/net-kind-badge';
import { formatCount } from '../../../lib/quantity-format';

function typingInto(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

type NetFilterBarProps = {
  text: string;
  onTextChange: (text: string) => void;
  kinds: ReadonlySet<NetKind>;
  onToggleKind: (kind: NetKind) => void;
  onClearKinds: () => void;
  /** Nets matching the text, per kind, before the kind chips apply. */
  kindCounts: Record<NetKind, number>;
  matched: number;
  total: number;
};

export function NetFilterBar({
  text,
  onTextChange,
  kinds,
  onToggleKind,
  onClearKinds,
  kindCounts,
  matched,
  total,
}: NetFilterBarProps) {
  const inputRef = useRef<HTMLInputElement>(null);

  // "f" jumps to the filter from anywhere on the page, as long as the user is not typing;
  // "/" belongs to the rail search in the board header, which opens a net's page.
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      if (event.key !== 'f' || event.ctrlKey || event.metaKey || event.altKey) return;
      if (typingInto(event.target)) return;
      event.preventDefault();
      inputRef.current?.focus();
      inputRef.current?.select();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);

  const chip = 'inline-flex h-7 items-center gap-1.5 rounded-md border px-2 text-[13px]';

  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-2">
      <div className="relative w-80 max-w-full">
        <label htmlFor="net-filter" className="sr-only">
          Filter nets by name or alias
        </label>
        <input
          ref={inputRef}
          id="net-filter"
          type="search"
          autoComplete="off"
          spellCheck={false}
          placeholder="Filter nets, e.g. vcc 3v3"
          value={text}
          onChange={(event) => onTextChange(event.target.value)}
          onKeyDown={(event) => {
            if (event.key === 'Escape') {
              event.stopPropagation();
              if (text) onTextChange('');
              else event.currentTarget.blur();
            }
          }}
          className={`${controlClass} h-8 pr-8 font-mono text-[13px]`}
        />
        <span className="pointer-events-none absolute top-1/2 right-2 -translate-y-1/2">
          <Kbd>F</Kbd>
        </span>
      </div>

      <div role="group" aria-label="Show kinds" className="flex flex-wrap items-center gap-1.5">
        <button
          type="button"
          aria-pressed={kinds.size === 0}
          onClick={onClearKinds}
          className={`${chip} ${
            kinds.size === 0
              ? 'border-line-strong bg-raised text-ink'
              : 'border-line text-ink-muted hover:text-ink'
          }`}
        >
          All kinds
        </button>
        {netKindOrder.map((kind) => {
          const on = kinds.has(kind);
          return (
            <button
              key={kind}
              type="button"
              aria-pressed={on}
              onClick={() => onToggleKind(kind)}
              className={`${chip} ${on ? netKindTone[kind] : 'border-line text-ink-muted hover:text-ink'}`}
            >
              <NetKindGlyph kind={kind} />
              {netKindLabel[kind]}
              <span className="font-mono text-xs tabular opacity-80">
                {formatCount(kindCounts[kind])}
              </span>
            </button>
          );
        })}
      </div>

      <p className="ml-auto text-[13px] text-ink-muted" aria-live="polite">
        <Count value={matched} /> of <span className="font-mono tabular">{formatCount(total)}</span>{' '}
        nets
      </p>
    </div>
  );
}
