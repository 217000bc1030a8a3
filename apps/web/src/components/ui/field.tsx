// Labelled form controls. Each control is tied to its label, hint and error by id,
// so a screen reader announces the message next to the field it belongs to.
import {
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';

export const controlClass = [
  'w-full rounded-md border bg-field px-2.5 text-sm text-ink placeholder:text-ink-faint',
  'border-line hover:border-line-strong focus-visible:border-accent',
  'aria-[invalid=true]:border-danger disabled:opacity-60',
].join(' ');

/** What a field hands its control: the id its label points at, and the ids of its hint and error. */
export type FieldControl = {
  id: string;
  'aria-describedby': string | undefined;
  'aria-invalid': true | undefined;
};

type FieldProps = {
  label: string;
  hint?: ReactNode;
  error?: string | undefined;
  optional?: boolean;
  children: (control: FieldControl) => ReactNode;
};

export function Field({ label, hint, error, optional, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-[13px] font-medium text-ink">
        {label}
        {optional && <span className="ml-1.5 font-normal text-ink-faint">optional</span>}
      </label>
      {children({ id, 'aria-describedby': describedBy, 'aria-invalid': error ? true : undefined })}
      {error && (
        <p id={errorId} className="text-[13px] text-danger first-letter:uppercase">
          {error}
        </p>
      )}
      {hint && (
        <p id={hintId} className="text-xs text-ink-faint">
          {hint}
        </p>
      )}
    </div>
  );
}

export function TextInput(props: InputHTMLAttributes<HTMLInputElement>) {
  return (
    <input type="text" {...props} className={`${controlClass} h-8.5 ${props.className ?? ''}`} />
  );
}

/** A text input with its unit ("V", "A", "Ω") written inside it at the right. */
export function UnitInput({
  unit,
  className,
  ...props
}: InputHTMLAttributes<HTMLInputElement> & { unit: string }) {
  return (
    <div className="relative">
      <TextInput {...props} className={`pr-7 font-mono ${className ?? ''}`} />
      <span className="pointer-events-none absolute top-1/2 right-2.5 -translate-y-1/2 text-[13px] text-ink-faint">
        {unit}
      </span>
    </div>
  );
}

export function TextArea(props: TextareaHTMLAttributes<HTMLTextAreaElement>) {
  return <textarea {...props} className={`${controlClass} py-1.5 ${props.className ?? ''}`} />;
}

export function Select(props: SelectHTMLAttributes<HTMLSelectElement>) {
  return <select {...props} className={`${controlClass} h-8.5 ${props.className ?? ''}`} />;
}

export function FileInput(props: Omit<InputHTMLAttributes<HTMLInputElement>, 'type'>) {
  return (
    <input
      type="file"
      {...props}
      className={[
        'block w-full rounded-md border border-dashed border-line-strong bg-field p-1.5 text-[13px] text-ink-muted',
        'hover:border-accent focus-visible:border-accent aria-[invalid=true]:border-danger',
        'file:mr-3 file:h-7 file:cursor-pointer file:rounded file:border file:border-line file:bg-raised',
        'file:px-2.5 file:text-[13px] file:font-medium file:text-ink',
        props.className ?? '',
      ].join(' ')}
    />
  );
}
