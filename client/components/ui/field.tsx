import {
  forwardRef,
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type TextareaHTMLAttributes,
} from 'react';

/** The look of every text box: the same edge, focus and error state wherever one is drawn. */
export const controlClass = (invalid?: boolean) =>
  `block rounded-control border bg-surface px-3 text-base text-ink focus:border-focus focus:outline-none focus:ring-2 focus:ring-focus/40 disabled:bg-tint disabled:text-ink-muted ${invalid ? 'border-danger' : 'border-line-strong'}`;

export interface FieldProps {
  label: ReactNode;
  error?: string;
  hint?: ReactNode;
}

/** What the control needs to be tied to its label, hint and error. */
export interface ControlA11y {
  id: string;
  'aria-invalid'?: true;
  'aria-describedby'?: string;
}

/**
 * The label, the control and, under it, the hint and the error, wired to each other for screen readers:
 * the control names both in aria-describedby, and the error is announced when it appears.
 */
export function Field({
  label,
  error,
  hint,
  id,
  children,
}: FieldProps & { id?: string; children: (a11y: ControlA11y) => ReactNode }) {
  const auto = useId();
  const controlId = id ?? auto;
  const described = [hint ? `${controlId}-hint` : '', error ? `${controlId}-error` : '']
    .filter(Boolean)
    .join(' ');
  return (
    <div>
      <label htmlFor={controlId} className="block text-sm font-bold text-ink-soft">
        {label}
      </label>
      {children({
        id: controlId,
        'aria-invalid': error ? true : undefined,
        'aria-describedby': described || undefined,
      })}
      {hint ? (
        <p id={`${controlId}-hint`} className="mt-1 text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${controlId}-error`} role="alert" className="mt-1 text-sm font-semibold text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export const Input = forwardRef<HTMLInputElement, InputHTMLAttributes<HTMLInputElement>>(function Input(
  { className = 'mt-1 w-full', ...rest },
  ref,
) {
  return (
    <input
      ref={ref}
      {...rest}
      className={`${controlClass(rest['aria-invalid'] === true)} min-h-touch ${className}`}
    />
  );
});

export const Textarea = forwardRef<HTMLTextAreaElement, TextareaHTMLAttributes<HTMLTextAreaElement>>(
  function Textarea({ className = 'mt-1 w-full', rows = 3, ...rest }, ref) {
    return (
      <textarea
        ref={ref}
        rows={rows}
        {...rest}
        className={`${controlClass(rest['aria-invalid'] === true)} py-2 ${className}`}
      />
    );
  },
);

export const TextField = forwardRef<HTMLInputElement, FieldProps & InputHTMLAttributes<HTMLInputElement>>(
  function TextField({ label, error, hint, id, ...rest }, ref) {
    return (
      <Field label={label} error={error} hint={hint} id={id}>
        {(a11y) => <Input ref={ref} {...a11y} {...rest} />}
      </Field>
    );
  },
);

export const TextAreaField = forwardRef<
  HTMLTextAreaElement,
  FieldProps & TextareaHTMLAttributes<HTMLTextAreaElement>
>(function TextAreaField({ label, error, hint, id, ...rest }, ref) {
  return (
    <Field label={label} error={error} hint={hint} id={id}>
      {(a11y) => <Textarea ref={ref} {...a11y} {...rest} />}
    </Field>
  );
});
