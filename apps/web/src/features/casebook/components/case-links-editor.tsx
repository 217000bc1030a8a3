// Which nets and parts of the board a case is about, picked from the board's own lists. A part can be
// marked as the culprit: the one that was at fault and got replaced or removed.
import type { ComponentRow, NetRow } from '@railyard/shared';
import { useMemo, useState } from 'react';
import { NetKindGlyph } from '../../../components/ui/net-kind-badge';
import { formatVolts } from '../../../lib/quantity-format';
import { partError, type FieldErrors, type PartRow } from '../case-form';
import { CulpritGlyph } from './case-marks';
import { NameCombobox } from './name-combobox';
import { CrossGlyph } from '../../../components/ui/glyph';

function RemoveButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <button
      type="button"
      onClick={onClick}
      aria-label={label}
      title="Remove"
      className="inline-grid size-5 place-items-center rounded text-ink-muted hover:bg-raised hover:text-danger"
    >
      <CrossGlyph size={9} />
    </button>
  );
}

type NetsEditorProps = {
  id: string;
  nets: readonly string[];
  boardNets: readonly NetRow[] | undefined;
  errors: FieldErrors;
  describedBy?: string;
  onChange: (nets: string[]) => void;
  max: number;
};

export function NetsEditor({
  id,
  nets,
  boardNets,
  errors,
  describedBy,
  onChange,
  max,
}: NetsEditorProps) {
  const [text, setText] = useState('');
  const taken = useMemo(() => new Set(nets), [nets]);
  const add = (name: string) => {
    setText('');
    if (!taken.has(name)) onChange([...nets, name]);
  };
  const listErrors = nets
    .map((net, index) => errors[`nets.${index}`] && `${net}: ${errors[`nets.${index}`]}`)
    .filter((message): message is string => !!message);
  return (
    <div className="space-y-1.5">
      {nets.length > 0 && (
        <ul className="flex flex-wrap gap-1.5" aria-label="Nets of this case">
          {nets.map((net, index) => (
            <li
              key={net}
              className={`inline-flex h-6.5 items-center gap-1 rounded-md border pr-0.5 pl-2 font-mono text-[12.5px] ${
                errors[`nets.${index}`]
                  ? 'border-danger bg-danger-soft'
                  : 'border-line-strong bg-raised'
              }`}
            >
              {net}
              <RemoveButton
                label={`Remove the net ${net}`}
                onClick={() => onChange(nets.filter((n) => n !== net))}
              />
            </li>
          ))}
        </ul>
      )}
      <NameCombobox
        id={id}
        what="nets"
        aria-describedby={describedBy}
        aria-invalid={listErrors.length > 0 || errors.nets ? true : undefined}
        placeholder={nets.length >= max ? `At most ${max} nets` : 'Add a net, e.g. VSYS'}
        className="max-w-sm"
        options={nets.length >= max ? [] : boardNets}
        taken={taken}
        text={text}
        onTextChange={setText}
        onPick={(net) => add(net.name)}
        detail={(net: NetRow) => (
          <>
            {formatVolts(net.nominalVoltage)}
            <NetKindGlyph kind={net.kind} size={11} />
          </>
        )}
      />
      {[errors.nets, ...listErrors].filter(Boolean).map((message) => (
        <p key={message} className="text-[13px] text-danger first-letter:uppercase">
          {message}
        </p>
      ))}
    </div>
  );
}

type PartOption = { name: string; kind: string; value: string };

type PartsEditorProps = {
  id: string;
  parts: readonly PartRow[];
  boardParts: readonly ComponentRow[] | undefined;
  /** the parts list could not be loaded: designators are taken as typed and the API checks them */
  partsUnavailable: boolean;
  errors: FieldErrors;
  describedBy?: string;
  onChange: (parts: PartRow[]) => void;
  max: number;
};

export function PartsEditor({
  id,
  parts,
  boardParts,
  partsUnavailable,
  errors,
  describedBy,
  onChange,
  max,
}: PartsEditorProps) {
  const [text, setText] = useState('');
  const options = useMemo<PartOption[] | undefined>(
    () => boardParts?.map((part) => ({ name: part.refdes, kind: part.kind, value: part.value })),
    [boardParts],
  );
  const byRefdes = useMemo(() => new Map(options?.map((part) => [part.name, part])), [options]);
  const taken = useMemo(() => new Set(parts.map((part) => part.refdes)), [parts]);
  const add = (refdes: string) => {
    setText('');
    if (!taken.has(refdes)) onChange([...parts, { refdes, culprit: false }]);
  };
  return (
    <div className="space-y-1.5">
      {parts.length > 0 && (
        <ul
          className="divide-y divide-line/60 rounded-md border border-line"
          aria-label="Parts of this case"
        >
          {parts.map((part, index) => {
            const known = byRefdes.get(part.refdes);
            const error = partError(errors, index);
            return (
              <li key={part.refdes} className={`px-2 py-1 ${error ? 'bg-danger-soft' : ''}`}>
                <div className="flex items-center gap-3 text-[13px]">
                  <span
                    className={`w-20 truncate font-mono ${part.culprit ? 'font-medium text-danger' : ''}`}
                  >
                    {part.refdes}
                  </span>
                  <span className="min-w-0 flex-1 truncate text-xs text-ink-muted">
                    {known ? [known.kind, known.value].filter(Boolean).join(' · ') : ''}
                  </span>
                  <label className="inline-flex shrink-0 cursor-pointer items-center gap-1.5 text-[13px]">
                    <input
                      type="checkbox"
                      checked={part.culprit}
                      onChange={(event) =>
                        onChange(
                          parts.map((p) =>
                            p.refdes === part.refdes ? { ...p, culprit: event.target.checked } : p,
                          ),
                        )
                      }
                      className="size-3.5 accent-[var(--ry-danger)]"
                    />
                    <span
                      className={`inline-flex items-center gap-1 whitespace-nowrap ${part.culprit ? 'text-danger' : 'text-ink-muted'}`}
                    >
                      <CulpritGlyph />
                      <span>
                        <span className="sr-only">{part.refdes} was the </span>culprit
                      </span>
                    </span>
                  </label>
                  <RemoveButton
                    label={`Remove the part ${part.refdes}`}
                    onClick={() => onChange(parts.filter((p) => p.refdes !== part.refdes))}
                  />
                </div>
                {error && (
                  <p className="mt-0.5 text-[13px] text-danger first-letter:uppercase">{error}</p>
                )}
              </li>
            );
          })}
        </ul>
      )}
      <NameCombobox
        id={id}
        what="parts"
        aria-describedby={describedBy}
        aria-invalid={errors.components ? true : undefined}
        placeholder={parts.length >= max ? `At most ${max} parts` : 'Add a part, e.g. C1013'}
        className="max-w-sm"
        options={parts.length >= max ? [] : (options ?? (partsUnavailable ? [] : undefined))}
        taken={taken}
        text={text}
        onTextChange={setText}
        onPick={(part) => add(part.name)}
        onEnterText={partsUnavailable ? (typed) => add(typed.toUpperCase()) : undefined}
        detail={(part: PartOption) => (
          <>
            <span>{part.kind}</span>
            {part.value && <span className="font-mono">{part.value}</span>}
          </>
        )}
      />
      {errors.components && <p className="text-[13px] text-danger">{errors.components}</p>}
    </div>
  );
}
