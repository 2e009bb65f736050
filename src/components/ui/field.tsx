import { useId, type ComponentProps, type ReactNode } from 'react';
import { cx } from './cx';

interface ControlProps {
  id: string;
  'aria-invalid': boolean;
  'aria-describedby'?: string;
}

interface FieldProps {
  label: string;
  hint?: ReactNode;
  error?: string;
  children: (control: ControlProps) => ReactNode;
}

/** Label, control, hint and error text, wired together so the error is read out with the field. */
export function Field({ label, hint, error, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-muted">
          {hint}
        </p>
      )}
      {children({ id, 'aria-invalid': Boolean(error), 'aria-describedby': describedBy })}
      {error && (
        <p id={errorId} className="flex items-start gap-1 text-sm font-semibold text-danger">
          <span aria-hidden="true">⚠</span>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}

/** The error under a fieldset of choices (radios, checkboxes), announced when it appears. */
export function FieldsetError({ error }: { error?: string }) {
  if (!error) return null;
  return (
    <p role="alert" className="flex items-start gap-1 text-sm font-semibold text-danger">
      <span aria-hidden="true">⚠</span>
      {error}
    </p>
  );
}

export const controlClass =
  'min-h-touch w-full rounded-md border-2 border-line bg-surface px-3 text-ink ' +
  'aria-[invalid=true]:border-danger focus-visible:border-ink';

type TextFieldProps = Omit<ComponentProps<'input'>, 'id'> & {
  label: string;
  hint?: ReactNode;
  error?: string;
};

export function TextField({ label, hint, error, className, ...input }: TextFieldProps) {
  return (
    <Field label={label} hint={hint} error={error}>
      {(control) => <input {...control} {...input} className={cx(controlClass, className)} />}
    </Field>
  );
}

type SelectFieldProps = Omit<ComponentProps<'select'>, 'id'> & {
  label: string;
  hint?: ReactNode;
  error?: string;
};

export function SelectField({
  label,
  hint,
  error,
  className,
  children,
  ...select
}: SelectFieldProps) {
  return (
    <Field label={label} hint={hint} error={error}>
      {(control) => (
        // The native arrow is drawn grey in dark schemes; ours follows the display mode.
        <div className="relative">
          <select
            {...control}
            {...select}
            className={cx(controlClass, 'appearance-none pr-10', className)}
          >
            {children}
          </select>
          <svg
            viewBox="0 0 24 24"
            aria-hidden="true"
            className="pointer-events-none absolute right-3 top-1/2 size-5 -translate-y-1/2"
            fill="none"
            stroke="currentColor"
            strokeWidth="2.5"
            strokeLinecap="round"
            strokeLinejoin="round"
          >
            <path d="M6 9l6 6 6-6" />
          </svg>
        </div>
      )}
    </Field>
  );
}
