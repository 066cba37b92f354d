import { forwardRef, useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';

interface FieldProps {
  label: string;
  error?: string;
  hint?: ReactNode;
}

const controlClass = (error?: string) =>
  `mt-1 block w-full rounded-xl border bg-white px-3 text-base text-tide-950 shadow-sm focus:border-tide-500 focus:outline-none focus:ring-2 focus:ring-tide-200 ${error ? 'border-ember-500' : 'border-tide-200'}`;

/** The label, the control and, under it, the error or else the hint, wired to each other for screen readers. */
function Field({ label, error, hint, id, control }: FieldProps & { id: string | undefined; control: (a11y: { id: string; 'aria-invalid'?: true; 'aria-describedby'?: string }) => ReactNode }) {
  const auto = useId();
  const inputId = id ?? auto;
  return (
    <div>
      <label htmlFor={inputId} className="block text-sm font-bold text-tide-800">{label}</label>
      {control({ id: inputId, 'aria-invalid': error ? true : undefined, 'aria-describedby': error ? `${inputId}-error` : hint ? `${inputId}-hint` : undefined })}
      {hint && !error ? <p id={`${inputId}-hint`} className="mt-1 text-sm text-tide-600">{hint}</p> : null}
      {error ? <p id={`${inputId}-error`} role="alert" className="mt-1 text-sm font-semibold text-ember-700">{error}</p> : null}
    </div>
  );
}

export const TextField = forwardRef<HTMLInputElement, FieldProps & InputHTMLAttributes<HTMLInputElement>>(function TextField({ label, error, hint, id, ...rest }, ref) {
  return <Field label={label} error={error} hint={hint} id={id} control={(a11y) => <input ref={ref} {...a11y} className={`${controlClass(error)} min-h-touch`} {...rest} />} />;
});

export const SelectField = forwardRef<HTMLSelectElement, FieldProps & SelectHTMLAttributes<HTMLSelectElement> & { options: { value: string; label: string }[] }>(
  function SelectField({ label, error, hint, id, options, ...rest }, ref) {
    return (
      <Field
        label={label}
        error={error}
        hint={hint}
        id={id}
        control={(a11y) => (
          <select ref={ref} {...a11y} className={`${controlClass(error)} min-h-touch`} {...rest}>
            {options.map((o) => (
              <option key={o.value} value={o.value}>{o.label}</option>
            ))}
          </select>
        )}
      />
    );
  },
);

export const TextAreaField = forwardRef<HTMLTextAreaElement, FieldProps & TextareaHTMLAttributes<HTMLTextAreaElement>>(function TextAreaField({ label, error, hint, id, rows = 3, ...rest }, ref) {
  return <Field label={label} error={error} hint={hint} id={id} control={(a11y) => <textarea ref={ref} rows={rows} {...a11y} className={`${controlClass(error)} py-2`} {...rest} />} />;
});
