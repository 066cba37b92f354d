import { forwardRef, useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';

interface FieldProps {
  label: string;
  error?: string;
  hint?: ReactNode;
}

const inputClass = (error?: string) =>
  `mt-1 block w-full min-h-touch rounded-xl border bg-white px-3 text-base text-tide-950 shadow-sm focus:border-tide-500 focus:outline-none focus:ring-2 focus:ring-tide-200 ${error ? 'border-ember-500' : 'border-tide-200'}`;

export const TextField = forwardRef<HTMLInputElement, FieldProps & InputHTMLAttributes<HTMLInputElement>>(function TextField(
  { label, error, hint, id, ...rest },
  ref,
) {
  const auto = useId();
  const inputId = id ?? auto;
  return (
    <div>
      <label htmlFor={inputId} className="block text-sm font-bold text-tide-800">{label}</label>
      <input ref={ref} id={inputId} aria-invalid={error ? true : undefined} aria-describedby={error ? `${inputId}-error` : hint ? `${inputId}-hint` : undefined} className={inputClass(error)} {...rest} />
      {hint && !error ? <p id={`${inputId}-hint`} className="mt-1 text-sm text-tide-600">{hint}</p> : null}
      {error ? <p id={`${inputId}-error`} role="alert" className="mt-1 text-sm font-semibold text-ember-700">{error}</p> : null}
    </div>
  );
});

export const SelectField = forwardRef<HTMLSelectElement, FieldProps & SelectHTMLAttributes<HTMLSelectElement> & { options: { value: string; label: string }[] }>(
  function SelectField({ label, error, hint, id, options, ...rest }, ref) {
    const auto = useId();
    const inputId = id ?? auto;
    return (
      <div>
        <label htmlFor={inputId} className="block text-sm font-bold text-tide-800">{label}</label>
        <select ref={ref} id={inputId} aria-invalid={error ? true : undefined} className={inputClass(error)} {...rest}>
          {options.map((o) => (
            <option key={o.value} value={o.value}>{o.label}</option>
          ))}
        </select>
        {hint && !error ? <p className="mt-1 text-sm text-tide-600">{hint}</p> : null}
        {error ? <p role="alert" className="mt-1 text-sm font-semibold text-ember-700">{error}</p> : null}
      </div>
    );
  },
);
