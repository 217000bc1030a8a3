// The "why" every privileged change carries; the audit log keeps it with who and when.
import { reasonMaxLength } from '../../lib/edit-reason';
import { Field, TextInput } from './field';

type ReasonFieldProps = {
  value: string;
  onChange: (value: string) => void;
  error?: string | undefined;
  label?: string;
  placeholder?: string;
  autoFocus?: boolean;
};

export function ReasonField({
  value,
  onChange,
  error,
  label = 'Reason',
  placeholder,
  autoFocus,
}: ReasonFieldProps) {
  return (
    <Field label={label} error={error} hint="Kept in the audit log with your name and the time.">
      {(control) => (
        <TextInput
          {...control}
          value={value}
          maxLength={reasonMaxLength}
          autoComplete="off"
          autoFocus={autoFocus}
          placeholder={placeholder}
          onChange={(event) => onChange(event.target.value)}
        />
      )}
    </Field>
  );
}
