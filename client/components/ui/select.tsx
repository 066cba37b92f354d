import { forwardRef, type SelectHTMLAttributes } from 'react';
import { controlClass, Field, type FieldProps } from './field';

export interface SelectOption {
  value: string;
  label: string;
}

type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & { options?: readonly SelectOption[] };

/** A native select with the kit's look; give `options`, or option elements as children. */
export const Select = forwardRef<HTMLSelectElement, SelectProps>(function Select(
  { className = 'mt-1 w-full', options, children, ...rest },
  ref,
) {
  return (
    <select
      ref={ref}
      {...rest}
      className={`${controlClass(rest['aria-invalid'] === true)} min-h-touch ${className}`}
    >
      {options?.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
      {children}
    </select>
  );
});

export const SelectField = forwardRef<HTMLSelectElement, FieldProps & SelectProps>(function SelectField(
  { label, error, hint, id, ...rest },
  ref,
) {
  return (
    <Field label={label} error={error} hint={hint} id={id}>
      {(a11y) => <Select ref={ref} {...a11y} {...rest} />}
    </Field>
  );
});
