// The readings of a case as editable rows: net, mode, the value measured and the known-good board's,
// with the difference worked out as the values are typed.
import type { NetRow, ReadingMode } from '@railyard/shared';
import { Button } from '../../../components/ui/button';
import { controlClass, Select } from '../../../components/ui/field';
import { NetKindGlyph } from '../../../components/ui/net-kind-badge';
import { formatVolts } from '../../../lib/quantity-format';
import { newReadingRow, type FieldErrors, type ReadingRow } from '../case-form';
import { readMeterValue } from '../../../lib/meter-value';
import {
  formatDifference,
  isMarkedDifference,
  readingDifference,
  readingModeLabel,
  readingModesInOrder,
  readingUnit,
} from '../reading-format';
import { NameCombobox } from './name-combobox';
import { CrossGlyph } from '../../../components/ui/glyph';

// One line per reading from md up; on a narrow screen net and mode take a line each, the two
// values share one, and the difference sits under them.
const rowColumns =
  'md:grid-cols-[minmax(9rem,1.4fr)_minmax(8.5rem,1fr)_minmax(6rem,0.8fr)_minmax(6rem,0.8fr)_4.5rem_2rem]';

const placeholders: Record<ReadingMode, { measured: string; knownGood: string }> = {
  diode_v: { measured: '0.192', knownGood: '0.345' },
  resistance_ohm: { measured: '9.5', knownGood: '38' },
  voltage_v: { measured: '0.00', knownGood: '3.30' },
};

function ValueInput({
  value,
  unit,
  caption,
  label,
  placeholder,
  error,
  errorId,
  onChange,
}: {
  value: string;
  unit: string;
  /** shown above the field on a narrow screen, where the column heads are hidden */
  caption: string;
  label: string;
  placeholder: string;
  error: string | undefined;
  errorId: string;
  onChange: (value: string) => void;
}) {
  return (
    <div>
      <span className="mb-0.5 block text-xs text-ink-muted md:hidden" aria-hidden="true">
        {caption}
      </span>
      <div className="relative">
        <input
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          maxLength={24}
          aria-label={label}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : undefined}
          placeholder={placeholder}
          value={value}
          onChange={(event) => onChange(event.target.value)}
          className={`${controlClass} h-8 pr-6 text-right font-mono text-[13px] tabular`}
        />
        <span className="pointer-events-none absolute top-1/2 right-2 -translate-y-1/2 text-[12px] text-ink-faint">
          {unit}
        </span>
      </div>
    </div>
  );
}

function LiveDifference({ row }: { row: ReadingRow }) {
  const measured = readMeterValue(row.measured, row.mode);
  const knownGood = readMeterValue(row.knownGood, row.mode);
  const difference =
    measured.ok && knownGood.ok && measured.value !== null
      ? readingDifference(measured.value, knownGood.value)
      : null;
  return (
    <span
      className={`font-mono text-[13px] tabular ${isMarkedDifference(difference) ? 'font-medium text-caution' : 'text-ink-muted'}`}
      title="Measured against known-good"
    >
      {difference === null ? '—' : formatDifference(difference)}
    </span>
  );
}

function ReadingRowEditor({
  row,
  index,
  nets,
  errors,
  onChange,
  onRemove,
}: {
  row: ReadingRow;
  index: number;
  nets: readonly NetRow[] | undefined;
  errors: FieldErrors;
  onChange: (row: ReadingRow) => void;
  onRemove: () => void;
}) {
  const path = `readings.${index}`;
  const rowErrors = [
    errors[`${path}.net`],
    errors[`${path}.mode`],
    errors[`${path}.measured`],
    errors[`${path}.knownGood`],
    errors[path],
  ].filter((message): message is string => !!message);
  const errorId = `reading-${row.key}-errors`;
  const unit = readingUnit[row.mode];
  const number = index + 1;
  return (
    <li className="py-1.5">
      <div className={`grid grid-cols-2 items-center gap-2 ${rowColumns}`}>
        <NameCombobox
          className="col-span-2 md:col-span-1"
          what="nets"
          ariaLabel={`Net of reading ${number}`}
          aria-invalid={errors[`${path}.net`] ? true : undefined}
          aria-describedby={rowErrors.length > 0 ? errorId : undefined}
          placeholder="Net"
          options={nets}
          text={row.net}
          onTextChange={(text) => onChange({ ...row, net: text })}
          onPick={(net) => onChange({ ...row, net: net.name })}
          detail={(net: NetRow) => (
            <>
              {formatVolts(net.nominalVoltage)}
              <NetKindGlyph kind={net.kind} size={11} />
            </>
          )}
        />
        <Select
          aria-label={`Mode of reading ${number}`}
          value={row.mode}
          onChange={(event) => onChange({ ...row, mode: event.target.value as ReadingMode })}
          className="col-span-2 h-8 text-[13px] md:col-span-1"
        >
          {readingModesInOrder.map((mode) => (
            <option key={mode} value={mode}>
              {readingModeLabel[mode]} ({readingUnit[mode]})
            </option>
          ))}
        </Select>
        <ValueInput
          caption="Measured"
          label={`Measured value of reading ${number}, in ${unit}`}
          unit={unit}
          value={row.measured}
          placeholder={placeholders[row.mode].measured}
          error={errors[`${path}.measured`]}
          errorId={errorId}
          onChange={(measured) => onChange({ ...row, measured })}
        />
        <ValueInput
          caption="Known-good"
          label={`Known-good value of reading ${number}, in ${unit}`}
          unit={unit}
          value={row.knownGood}
          placeholder={placeholders[row.mode].knownGood}
          error={errors[`${path}.knownGood`]}
          errorId={errorId}
          onChange={(knownGood) => onChange({ ...row, knownGood })}
        />
        <span className="md:text-right">
          <span className="mr-1.5 text-xs text-ink-muted md:hidden" aria-hidden="true">
            Difference
          </span>
          <LiveDifference row={row} />
        </span>
        <button
          type="button"
          onClick={onRemove}
          aria-label={`Remove reading ${number}`}
          title="Remove this reading"
          className="inline-grid size-8 place-items-center justify-self-end rounded-md text-ink-muted hover:bg-raised hover:text-danger"
        >
          <CrossGlyph size={11} />
        </button>
      </div>
      {rowErrors.length > 0 && (
        <p id={errorId} className="mt-1 text-[13px] text-danger first-letter:uppercase">
          {rowErrors.join('; ')}
        </p>
      )}
    </li>
  );
}

type ReadingsEditorProps = {
  rows: readonly ReadingRow[];
  nets: readonly NetRow[] | undefined;
  errors: FieldErrors;
  /** the net a new row starts on: the last one measured, or the first net of the case */
  defaultNet: string;
  onChange: (rows: ReadingRow[]) => void;
  maxRows: number;
};

export function ReadingsEditor({
  rows,
  nets,
  errors,
  defaultNet,
  onChange,
  maxRows,
}: ReadingsEditorProps) {
  const head = 'text-xs font-medium text-ink-muted';
  return (
    <div>
      {rows.length > 0 && (
        <div
          aria-hidden="true"
          className={`hidden gap-2 border-b border-line pb-1 md:grid ${rowColumns}`}
        >
          <span className={head}>Net</span>
          <span className={head}>Mode</span>
          <span className={`${head} text-right`}>Measured</span>
          <span className={`${head} text-right`}>Known-good</span>
          <span className={`${head} text-right`}>Difference</span>
          <span />
        </div>
      )}
      <ol className="divide-y divide-line/60">
        {rows.map((row, index) => (
          <ReadingRowEditor
            key={row.key}
            row={row}
            index={index}
            nets={nets}
            errors={errors}
            onChange={(changed) => onChange(rows.map((r) => (r.key === row.key ? changed : r)))}
            onRemove={() => onChange(rows.filter((r) => r.key !== row.key))}
          />
        ))}
      </ol>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <Button
          size="sm"
          disabled={rows.length >= maxRows}
          onClick={() => {
            const last = rows.at(-1);
            const next = newReadingRow(last?.net ?? defaultNet);
            onChange([...rows, last ? { ...next, mode: last.mode } : next]);
          }}
        >
          + Add a reading
        </Button>
        {errors.readings && <p className="text-[13px] text-danger">{errors.readings}</p>}
      </div>
    </div>
  );
}
