// Before the bench supply is switched on: what a setting will do to this rail's short. The technician
// types the supply voltage, the current limit and, once measured, the rail's resistance to ground;
// the answer follows as they type (packages/injection-power: the constant-voltage / constant-current
// supply). Nothing is sent anywhere.
import {
  InjectionInputError,
  injectionConcerns,
  mostPowerIntoShort,
  supplyIntoShort,
  type InjectionConcern,
  type ShortLoad,
  type SupplySetting,
} from '@railyard/injection-power';
import { useId, useState, type ReactNode } from 'react';
import { Field, UnitInput, type FieldControl } from '../../../components/ui/field';
import { readMeterValue, type MeterQuantity } from '../../../lib/meter-value';
import { formatSi, formatVolts } from '../../../lib/quantity-format';

type Fields = 'volts' | 'amps' | 'ohms';

/** Common practice: start around 1 V, or lower on a rail made for less. */
function startingVolts(railVolts: number | null): string {
  const size = railVolts === null ? 0 : Math.abs(railVolts);
  return size > 0 && size < 1 ? String(size) : '1';
}

function read(text: string, quantity: MeterQuantity, required: string) {
  const value = readMeterValue(text, quantity);
  if (!value.ok) return { error: value.error };
  if (value.value === null) return required ? { error: required } : { value: null };
  return { value: value.value };
}

function concernText(concern: InjectionConcern, setting: SupplySetting, railVolts: number | null) {
  switch (concern) {
    case 'above_rail_voltage':
      return `${formatVolts(setting.volts)} is above this rail’s ${formatVolts(Math.abs(railVolts ?? 0))}: parts on the rail are not made for more. Set the supply to the rail’s voltage or less.`;
    case 'rail_voltage_unknown':
      return 'This rail’s voltage is not known here, so there is no ceiling to check against: find it in the service documentation first.';
    case 'negative_rail':
      return 'This rail runs below ground: the supply’s positive lead goes to ground and its negative lead to the rail.';
  }
}

/** A quantity that never breaks between its number and its unit. */
function Q({ value, unit }: { value: number; unit: string }) {
  return <span className="whitespace-nowrap">{formatSi(value, unit)}</span>;
}

function Outcome({ setting, load }: { setting: SupplySetting; load: ShortLoad | null }) {
  if (load === null) {
    const most = mostPowerIntoShort(setting);
    return (
      <p>
        Into any short this puts at most{' '}
        <strong>
          <Q value={most.watts} unit="W" />
        </strong>{' '}
        (
        <Q value={setting.volts} unit="V" /> × <Q value={setting.amps} unit="A" />
        ), reached at <Q value={most.atOhms} unit="Ω" /> to ground; below that the supply holds the
        current at <Q value={setting.amps} unit="A" />. Measure the rail’s resistance to ground for
        the figure of this short.
      </p>
    );
  }
  const heat = (
    <strong>
      <Q value={load.watts} unit="W" />
    </strong>
  );
  switch (load.mode) {
    case 'constant_current':
      return (
        <p>
          The supply limits the current: <Q value={load.amps} unit="A" /> through the short at{' '}
          <Q value={load.volts} unit="V" />, {heat} in it.
        </p>
      );
    case 'constant_voltage':
      return (
        <p>
          The supply holds <Q value={load.volts} unit="V" />: <Q value={load.amps} unit="A" />{' '}
          through the short, {heat} in it. More current would not flow at this voltage.
        </p>
      );
    case 'crossover':
      return (
        <p>
          Both limits meet: <Q value={load.amps} unit="A" /> at <Q value={load.volts} unit="V" />,{' '}
          {heat} in the short, the most this setting can put into it.
        </p>
      );
  }
}

export function InjectionPlanner({ railVolts }: { railVolts: number | null }) {
  const headingId = useId();
  const [text, setText] = useState<Record<Fields, string>>({
    volts: startingVolts(railVolts),
    amps: '1',
    ohms: '',
  });
  const volts = read(text.volts, 'voltage_v', 'give the supply voltage');
  const amps = read(text.amps, 'current_a', 'give the current limit');
  const ohms = read(text.ohms, 'resistance_ohm', '');
  const errors: Partial<Record<Fields, string>> = {
    volts: volts.error,
    amps: amps.error,
    ohms: ohms.error,
  };

  let outcome: ReactNode = null;
  let concerns: InjectionConcern[] = [];
  let setting: SupplySetting | null = null;
  if (!volts.error && !amps.error && !ohms.error) {
    try {
      setting = { volts: volts.value as number, amps: amps.value as number };
      concerns = injectionConcerns(setting, railVolts);
      const load = ohms.value == null ? null : supplyIntoShort(setting, ohms.value);
      outcome = <Outcome setting={setting} load={load} />;
    } catch (err) {
      if (!(err instanceof InjectionInputError)) throw err;
      errors[err.field] = err.message;
      setting = null;
    }
  }

  const input = (field: Fields, unit: string, placeholder: string) => (control: FieldControl) => (
    <UnitInput
      {...control}
      unit={unit}
      inputMode="decimal"
      autoComplete="off"
      spellCheck={false}
      value={text[field]}
      placeholder={placeholder}
      onChange={(event) => setText((was) => ({ ...was, [field]: event.target.value }))}
    />
  );

  return (
    <section aria-labelledby={headingId} className="mt-2.5 border-t border-caution/30 pt-2.5">
      <h3 id={headingId} className="text-[13px] font-semibold">
        What the supply will do
      </h3>
      <div className="mt-1.5 grid grid-cols-3 gap-2">
        <Field label="Supply" error={errors.volts}>
          {input('volts', 'V', 'e.g. 1')}
        </Field>
        <Field label="Limit" error={errors.amps}>
          {input('amps', 'A', 'e.g. 0.5')}
        </Field>
        <Field label="To ground" error={errors.ohms}>
          {input('ohms', 'Ω', 'if read')}
        </Field>
      </div>
      <div aria-live="polite" className="mt-2 space-y-1.5">
        {outcome}
        {setting &&
          concerns.map((concern) => (
            <p
              key={concern}
              role={concern === 'above_rail_voltage' ? 'alert' : undefined}
              className={
                concern === 'above_rail_voltage' ? 'font-semibold text-danger' : 'text-ink-muted'
              }
            >
              {concernText(concern, setting as SupplySetting, railVolts)}
            </p>
          ))}
      </div>
    </section>
  );
}
