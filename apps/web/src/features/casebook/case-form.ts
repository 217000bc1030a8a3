// The case editor's form state and its way to and from the API. The form keeps what was typed (text),
// so a half-typed "0,3" stays on screen; reading it gives the payload the API takes, checked with the
// contract's own schema, or the problems keyed the way the API keys them in `details.issues`
// (the field path joined by dots: "title", "readings.2.measured", "components.0.refdes").
import {
  caseCreateSchema,
  type CaseCreate,
  type CaseDetail,
  type CaseOutcome,
  type CaseStatus,
  type CaseUpdate,
  type ReadingMode,
} from '@railyard/shared';
import { readMeterValue } from '../../lib/meter-value';
import { readMinutes } from './time-spent';

export type ReadingRow = {
  /** keeps React's rows apart while rows are added and removed; never sent */
  key: number;
  net: string;
  mode: ReadingMode;
  measured: string;
  knownGood: string;
};

export type PartRow = { refdes: string; culprit: boolean };

export type CaseForm = {
  title: string;
  symptom: string;
  outcome: CaseOutcome | '';
  minutes: string;
  rootCause: string;
  fixSteps: string;
  body: string;
  nets: string[];
  parts: PartRow[];
  readings: ReadingRow[];
};

/** Messages by API field path; the first problem per field is the one shown. */
export type FieldErrors = Partial<Record<string, string>>;

let nextRowKey = 1;

export function newReadingRow(net = ''): ReadingRow {
  return { key: nextRowKey++, net, mode: 'diode_v', measured: '', knownGood: '' };
}

export function emptyCaseForm(preset: { nets?: string[]; parts?: string[] } = {}): CaseForm {
  return {
    title: '',
    symptom: '',
    outcome: '',
    minutes: '',
    rootCause: '',
    fixSteps: '',
    body: '',
    nets: [...new Set(preset.nets ?? [])],
    parts: [...new Set(preset.parts ?? [])].map((refdes) => ({ refdes, culprit: false })),
    readings: [],
  };
}

// String(0.192) is "0.192" and String(1e-7) "1e-7": both read back to the same number.
const asText = (value: number | null) => (value === null ? '' : String(value));

export function caseFormFrom(detail: CaseDetail): CaseForm {
  return {
    title: detail.title,
    symptom: detail.symptom,
    outcome: detail.outcome,
    minutes: asText(detail.minutesSpent),
    rootCause: detail.rootCause,
    fixSteps: detail.fixSteps,
    body: detail.body,
    nets: [...detail.nets],
    parts: detail.components.map((part) => ({ refdes: part.refdes, culprit: part.culprit })),
    readings: detail.readings.map((reading) => ({
      key: nextRowKey++,
      net: reading.net,
      mode: reading.mode,
      measured: asText(reading.measured),
      knownGood: asText(reading.knownGood),
    })),
  };
}

/** The case as the API holds it, in the shape of a create payload: what an edit is compared with. */
export function payloadOf(detail: CaseDetail): CaseCreate {
  return {
    status: detail.status,
    title: detail.title,
    symptom: detail.symptom,
    rootCause: detail.rootCause,
    fixSteps: detail.fixSteps,
    body: detail.body,
    outcome: detail.outcome,
    minutesSpent: detail.minutesSpent,
    readings: detail.readings.map(({ net, mode, measured, knownGood }) => ({
      net,
      mode,
      measured,
      knownGood,
    })),
    nets: [...detail.nets],
    components: detail.components.map(({ refdes, culprit }) => ({ refdes, culprit })),
  };
}

export type ReadForm = { ok: true; payload: CaseCreate } | { ok: false; errors: FieldErrors };

/** The payload for the API, or every problem found, each under the field it belongs to. */
export function readCaseForm(form: CaseForm, status: CaseStatus): ReadForm {
  const errors: FieldErrors = {};
  const minutes = readMinutes(form.minutes);
  if (!minutes.ok) errors.minutesSpent = minutes.error;
  if (form.outcome === '') errors.outcome = 'say how the repair ended';

  const readings = form.readings.map((row, index) => {
    const measured = readMeterValue(row.measured, row.mode);
    const knownGood = readMeterValue(row.knownGood, row.mode);
    if (!measured.ok) errors[`readings.${index}.measured`] = measured.error;
    else if (measured.value === null)
      errors[`readings.${index}.measured`] = 'give the measured value';
    if (!knownGood.ok) errors[`readings.${index}.knownGood`] = knownGood.error;
    return {
      net: row.net.trim(),
      mode: row.mode,
      // NaN stands in for a value already reported above; the schema refuses it too.
      measured: measured.ok && measured.value !== null ? measured.value : Number.NaN,
      knownGood: knownGood.ok ? knownGood.value : null,
    };
  });

  const candidate = {
    status,
    title: form.title,
    symptom: form.symptom,
    rootCause: form.rootCause,
    fixSteps: form.fixSteps,
    body: form.body,
    outcome: form.outcome === '' ? undefined : form.outcome,
    minutesSpent: minutes.ok ? minutes.minutes : null,
    readings,
    nets: form.nets,
    components: form.parts.map((part) => ({ refdes: part.refdes.trim(), culprit: part.culprit })),
  };
  const parsed = caseCreateSchema.safeParse(candidate);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = issue.path.map(String).join('.');
      // A value already reported by its reader keeps that message.
      if (field !== '') errors[field] ??= issue.message;
    }
  }
  if (Object.keys(errors).length > 0 || !parsed.success) return { ok: false, errors };
  return { ok: true, payload: parsed.data };
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * What an edit changes, for PATCH: only the fields that differ, each list whole (the API replaces a
 * list it is given). A published case stays published, so its status is never sent.
 */
export function caseChanges(before: CaseCreate, after: CaseCreate): CaseUpdate {
  const change: CaseUpdate = {};
  if (before.status === 'draft' && after.status === 'published') change.status = 'published';
  if (before.title !== after.title) change.title = after.title;
  if (before.symptom !== after.symptom) change.symptom = after.symptom;
  if (before.rootCause !== after.rootCause) change.rootCause = after.rootCause;
  if (before.fixSteps !== after.fixSteps) change.fixSteps = after.fixSteps;
  if (before.body !== after.body) change.body = after.body;
  if (before.outcome !== after.outcome) change.outcome = after.outcome;
  if (before.minutesSpent !== after.minutesSpent) change.minutesSpent = after.minutesSpent;
  if (!same(before.readings, after.readings)) change.readings = after.readings;
  if (!same(before.nets, after.nets)) change.nets = after.nets;
  if (!same(before.components, after.components)) change.components = after.components;
  return change;
}

/**
 * Nets the board does not have, by field, before the API is asked: `isBoardNet` answers for a
 * printed name or an alias. Blank reading nets are left to the schema's own message.
 */
export function unknownNetErrors(
  form: CaseForm,
  isBoardNet: (name: string) => boolean,
): FieldErrors {
  const errors: FieldErrors = {};
  const unknown = (name: string) => `${name} is not a net of this board`;
  form.nets.forEach((net, index) => {
    if (!isBoardNet(net)) errors[`nets.${index}`] = unknown(net);
  });
  form.readings.forEach((row, index) => {
    const net = row.net.trim();
    if (net !== '' && !isBoardNet(net)) errors[`readings.${index}.net`] = unknown(net);
  });
  return errors;
}

/** The message for a part's row: the API names `components.N.refdes`, the contract `components.N`. */
export function partError(errors: FieldErrors, index: number): string | undefined {
  return errors[`components.${index}.refdes`] ?? errors[`components.${index}`];
}
