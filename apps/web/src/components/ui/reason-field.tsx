// The "why" every privileged change carries; the audit log keeps it with who and when.
import { reasonMaxLength } from '../../lib/edit-reason';
import { Field, TextArea, TextInput } from './field';

type ReasonFieldProps = {
  value: string;
  onChange: (value: string) => void;
  error?: string | undefined;
  label?: string;
  placeholder?: string | undefined;
  autoFocus?: boolean;
  /** a text area of this many lines, for a reason that takes a sentence or two */
  rows?: number | undefined;
  /** false for a reason no audit entry keeps (a member's report), so the hint does not promise it */
  audited?: boolean | undefined;
};

export function ReasonField({
  value,
  onChange,
  error,
  label = 'Reason',
  placeholder,
  autoFocus,
  rows,
  audited = true,
}: ReasonFieldProps) {
  const hint = audited ? 'Kept in the audit log with your name and the time.' : undefined;
  return (
    <Field label={label} error={error} hint={hint}>
      {(control) => {
        const shared = {
          ...control,
          value,
          maxLength: reasonMaxLength,
          autoComplete: 'off',
          autoFocus,
          placeholder,
        };
        return rows === undefined ? (
          <TextInput {...shared} onChange={(event) => onChange(event.target.value)} />
        ) : (
          <TextArea {...shared} rows={rows} onChange={(event) => onChange(event.target.value)} />
        );
      }}
    </Field>
  );
}
