// Checks the import form against the same zod schemas the API applies, so a technician
// sees what is wrong next to the field before anything is uploaded.
import { boardMetaSchema, boardSlugSchema, type BoardMeta } from '@railyard/shared';

export type BoardFields = {
  slug: string;
  title: string;
  deviceFamily: string;
  boardNumber: string;
  revision: string;
  /** As typed; blank means not known. */
  batteryVoltage: string;
  notes: string;
};

export type BoardFieldName = keyof BoardFields;
export type FieldErrors = Partial<Record<BoardFieldName | 'netlist', string>>;

export const emptyBoardFields: BoardFields = {
  slug: '',
  title: '',
  deviceFamily: '',
  boardNumber: '',
  revision: '',
  batteryVoltage: '',
  notes: '',
};

type ErrorMap = NonNullable<NonNullable<Parameters<typeof boardMetaSchema.safeParse>[1]>['error']>;

/** Plain-language messages for the checks whose default zod wording reads like a stack trace. */
const plainMessages: ErrorMap = (issue) => {
  if (issue.code === 'too_small' && issue.origin === 'string') {
    return Number(issue.minimum) <= 1 ? 'Required' : `At least ${issue.minimum} characters`;
  }
  if (issue.code === 'too_big' && issue.origin === 'string') {
    return `At most ${issue.maximum} characters`;
  }
  if (issue.code === 'too_small' && issue.origin === 'number') {
    return issue.inclusive ? `At least ${issue.minimum} V` : `Must be more than ${issue.minimum} V`;
  }
  if (issue.code === 'too_big' && issue.origin === 'number') {
    return `At most ${issue.maximum} V`;
  }
  return undefined;
};

/** "11.4", "11,4" and "11.4 V" all read as 11.4 volts; blank is "not known". */
export function parseVolts(text: string): number | null | 'invalid' {
  const trimmed = text.trim().replace(/\s*v$/i, '').replace(',', '.');
  if (trimmed === '') return null;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)$/.test(trimmed)) return 'invalid';
  return Number(trimmed);
}

/** A slug suggested from the title, for users who do not pick one themselves. */
export function slugFromTitle(title: string): string {
  return title
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 64)
    .replace(/-+$/, '');
}

export type BoardCheck =
  { ok: true; slug: string; meta: BoardMeta } | { ok: false; errors: FieldErrors };

export function checkNewBoard(fields: BoardFields): BoardCheck {
  const errors: FieldErrors = {};

  const slug = boardSlugSchema.safeParse(fields.slug.trim(), { error: plainMessages });
  if (!slug.success) errors.slug = slug.error.issues[0]?.message ?? 'Not a valid slug';

  const volts = parseVolts(fields.batteryVoltage);
  if (volts === 'invalid') errors.batteryVoltage = 'Enter volts as a number, e.g. 11.4';

  const meta = boardMetaSchema.safeParse(
    {
      title: fields.title,
      deviceFamily: fields.deviceFamily,
      boardNumber: fields.boardNumber,
      revision: fields.revision,
      batteryVoltage: volts === 'invalid' ? null : volts,
      notes: fields.notes,
    },
    { error: plainMessages },
  );
  if (!meta.success) {
    for (const issue of meta.error.issues) {
      const field = issue.path[0];
      if (typeof field === 'string' && field in emptyBoardFields) {
        errors[field as BoardFieldName] ??= issue.message;
      }
    }
  }

  if (!slug.success || !meta.success || Object.keys(errors).length > 0)
    return { ok: false, errors };
  return { ok: true, slug: slug.data, meta: meta.data };
}

/**
 * Where an issue the API sent back belongs on this form: its last path segment when that is
 * one of the form's fields ("board.title" → title), otherwise nowhere in particular.
 */
export function formFieldOf(apiField: string | null): BoardFieldName | 'netlist' | null {
  if (!apiField) return null;
  const last = apiField.split('.').pop() ?? '';
  if (last === 'netlist' || last in emptyBoardFields) return last as BoardFieldName | 'netlist';
  return null;
}
