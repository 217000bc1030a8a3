// A text field that offers the board's nets or parts as you type: the arrows move, Enter or a click
// takes the highlighted name, Esc closes the list. The caller owns the text, so the same field serves
// as a picker (cleared after each pick) and as a field whose text is the value (a reading's net).
import {
  useEffect,
  useId,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent,
  type ReactNode,
} from 'react';
import { controlClass } from '../../../components/ui/field';
import { matchNames, type NameOption } from '../name-match';

const shownMatches = 8;

type ControlProps = {
  id?: string;
  'aria-describedby'?: string | undefined;
  'aria-invalid'?: true | undefined;
};

type NameComboboxProps<T extends NameOption> = ControlProps & {
  /** the names to offer; undefined while they load */
  options: readonly T[] | undefined;
  text: string;
  onTextChange: (text: string) => void;
  onPick: (option: T) => void;
  /** names already taken, left out of the list */
  taken?: ReadonlySet<string>;
  /** what an option shows beside its name (kind, value, voltage) */
  detail?: (option: T) => ReactNode;
  /** Enter on text that matches nothing; without it Enter does nothing then */
  onEnterText?: (text: string) => void;
  placeholder?: string;
  /** for a field without a visible label */
  ariaLabel?: string;
  className?: string;
  inputClassName?: string;
  what: string;
};

export function NameCombobox<T extends NameOption>({
  options,
  text,
  onTextChange,
  onPick,
  taken,
  detail,
  onEnterText,
  placeholder,
  ariaLabel,
  className,
  inputClassName,
  what,
  ...control
}: NameComboboxProps<T>) {
  const ownId = useId();
  const inputId = control.id ?? `${ownId}-input`;
  const listId = `${ownId}-list`;
  const optionId = (index: number) => `${ownId}-option-${index}`;
  const list = useRef<HTMLUListElement>(null);
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);

  const matches = useMemo(() => {
    if (!options) return [];
    const free = taken && taken.size > 0 ? options.filter((o) => !taken.has(o.name)) : options;
    return matchNames(free, text, shownMatches);
  }, [options, taken, text]);
  const expanded = open && text.trim() !== '';
  const current = Math.min(active, Math.max(0, matches.length - 1));

  useEffect(() => {
    if (!expanded) return;
    list.current?.children
      .namedItem(`${ownId}-option-${current}`)
      ?.scrollIntoView({ block: 'nearest' });
  }, [ownId, current, expanded]);

  const pick = (index: number) => {
    const option = matches[index];
    if (!option) return;
    onPick(option);
    setOpen(false);
    setActive(0);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    switch (event.key) {
      case 'ArrowDown':
      case 'ArrowUp': {
        if (matches.length === 0) return;
        event.preventDefault();
        if (!open) {
          setOpen(true);
          return;
        }
        const step = event.key === 'ArrowDown' ? 1 : -1;
        setActive((current + step + matches.length) % matches.length);
        return;
      }
      case 'Enter':
        if (text.trim() === '') return;
        // Enter picks, it never submits the form around the field.
        event.preventDefault();
        if (expanded && matches.length > 0) pick(current);
        else onEnterText?.(text.trim());
        return;
      case 'Escape':
        if (!expanded) return;
        event.preventDefault();
        event.stopPropagation();
        setOpen(false);
        return;
    }
  };

  return (
    <div
      className={`relative ${className ?? ''}`}
      onBlur={(event) => {
        if (!event.currentTarget.contains(event.relatedTarget)) setOpen(false);
      }}
    >
      <input
        id={inputId}
        type="text"
        role="combobox"
        aria-expanded={expanded}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={expanded && matches.length > 0 ? optionId(current) : undefined}
        aria-label={ariaLabel}
        aria-describedby={control['aria-describedby']}
        aria-invalid={control['aria-invalid']}
        autoComplete="off"
        spellCheck={false}
        maxLength={200}
        placeholder={placeholder}
        value={text}
        onFocus={() => setOpen(true)}
        onChange={(event) => {
          onTextChange(event.target.value);
          setActive(0);
          setOpen(true);
        }}
        onKeyDown={onKeyDown}
        className={`${controlClass} h-8 font-mono text-[13px] ${inputClassName ?? ''}`}
      />
      <ul
        ref={list}
        id={listId}
        role="listbox"
        aria-label={`${what} on this board`}
        hidden={!expanded}
        className="absolute top-full left-0 z-40 mt-1 max-h-72 w-full min-w-64 overflow-auto rounded-md border border-line-strong bg-surface py-1 shadow-lg shadow-black/30"
      >
        {expanded && !options && (
          <li role="presentation" className="px-3 py-1.5 text-[13px] text-ink-muted">
            Loading the board’s {what}…
          </li>
        )}
        {expanded && options && matches.length === 0 && (
          <li role="presentation" className="px-3 py-1.5 text-[13px] text-ink-muted">
            No {what} on this board match “{text.trim()}”.
          </li>
        )}
        {matches.map((option, index) => (
          <li
            key={option.name}
            id={optionId(index)}
            role="option"
            aria-selected={index === current}
            // mousedown, not click: the field must not lose focus (and close the list) first
            onMouseDown={(event) => {
              event.preventDefault();
              pick(index);
            }}
            onMouseMove={() => setActive(index)}
            className={`flex cursor-pointer items-center gap-2 px-3 py-1 text-[13px] ${
              index === current ? 'bg-select text-ink' : 'text-ink'
            }`}
          >
            <span className="truncate font-mono">{option.name}</span>
            {detail && (
              <span className="ml-auto flex shrink-0 items-center gap-1.5 text-xs text-ink-muted">
                {detail(option)}
              </span>
            )}
          </li>
        ))}
      </ul>
    </div>
  );
}
