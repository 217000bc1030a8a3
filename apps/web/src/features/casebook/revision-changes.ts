// What one revision of a case changed, as text a reader can compare: each changed field with the
// value before and after. Lists are written one entry per line, so a changed reading stands out.
import type { CaseRevisionSnapshot } from '@railyard/shared';
import { outcomeLabel } from './case-vocabulary';
import { formatReading, readingModeShort } from './reading-format';
import { formatMinutes } from './time-spent';

/** The case's own fields; `merged` is the text of another case, shown apart from the changes. */
export type SnapshotField = Exclude<keyof CaseRevisionSnapshot, 'merged'>;

/** Field names as people read them, in the order the API lists changes. */
export const snapshotFieldLabel: Record<SnapshotField, string> = {
  status: 'Status',
  title: 'Title',
  symptom: 'Symptom',
  rootCause: 'Root cause',
  fixSteps: 'Fix steps',
  body: 'Notes',
  outcome: 'Outcome',
  minutesSpent: 'Time spent',
  readings: 'Readings',
  nets: 'Nets',
  components: 'Parts',
};

const fieldOrder = Object.keys(snapshotFieldLabel) as SnapshotField[];

export function snapshotText(
  snapshot: Omit<CaseRevisionSnapshot, 'merged'>,
  field: SnapshotField,
): string {
  switch (field) {
    case 'status':
      return snapshot.status;
    case 'outcome':
      return outcomeLabel[snapshot.outcome];
    case 'minutesSpent':
      return formatMinutes(snapshot.minutesSpent);
    case 'readings':
      return snapshot.readings
        .map((r) => {
          const known =
            r.knownGood === null ? '' : `, known-good ${formatReading(r.mode, r.knownGood)}`;
          return `${r.net} ${readingModeShort[r.mode]} ${formatReading(r.mode, r.measured)}${known}`;
        })
        .join('\n');
    case 'nets':
      return snapshot.nets.join('\n');
    case 'components':
      return snapshot.components
        .map((c) => (c.culprit ? `${c.refdes} (culprit)` : c.refdes))
        .join('\n');
    default:
      return snapshot[field];
  }
}

export type FieldChange = {
  field: SnapshotField;
  label: string;
  before: string | null;
  after: string;
};

/**
 * The fields `changed` names, with their text in `previous` (null for the first revision, which
 * wrote every field) and in `current`, in field order.
 */
export function revisionChanges(
  current: CaseRevisionSnapshot,
  previous: CaseRevisionSnapshot | null,
  changed: readonly string[],
): FieldChange[] {
  return fieldOrder
    .filter((field) => changed.includes(field))
    .map((field) => ({
      field,
      label: snapshotFieldLabel[field],
      before: previous ? snapshotText(previous, field) : null,
      after: snapshotText(current, field),
    }));
}
