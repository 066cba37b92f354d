import { forwardRef, useId, type ReactNode, type TextareaHTMLAttributes } from 'react';

export const TextAreaField = forwardRef<HTMLTextAreaElement, { label: string; error?: string; hint?: ReactNode } & TextareaHTMLAttributes<HTMLTextAreaElement>>(
  function TextAreaField({ label, error, hint, id, rows = 3, ...rest }, ref) {
    const auto = useId();
    const inputId = id ?? auto;
    return (
      <div>
        <label htmlFor={inputId} className="block text-sm font-bold text-tide-800">{label}</label>
        <textarea
          ref={ref}
          id={inputId}
          rows={rows}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${inputId}-error` : hint ? `${inputId}-hint` : undefined}
          className={`mt-1 block w-full rounded-xl border bg-white px-3 py-2 text-base text-tide-950 shadow-sm focus:border-tide-500 focus:outline-none focus:ring-2 focus:ring-tide-200 ${error ? 'border-ember-500' : 'border-tide-200'}`}
          {...rest}
        />
        {hint && !error ? <p id={`${inputId}-hint`} className="mt-1 text-sm text-tide-600">{hint}</p> : null}
        {error ? <p id={`${inputId}-error`} role="alert" className="mt-1 text-sm font-semibold text-ember-700">{error}</p> : null}
      </div>
    );
  },
);
