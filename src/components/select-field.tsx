import { useId, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cn } from '../lib/cn.ts';
import { Field, controlClasses, describedBy } from './field.tsx';

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  label: string;
  options: readonly SelectOption[];
  hint?: ReactNode;
  error?: string;
  id?: string;
  ref?: Ref<HTMLSelectElement>;
}

/** A labelled native select (keyboard and screen-reader behaviour come for free). */
export function SelectField({ label, options, hint, error, id, className, ...rest }: SelectFieldProps) {
  const autoId = useId();
  const fieldId = id ?? `f${autoId.replace(/:/g, '')}`;
  return (
    <Field id={fieldId} label={label} hint={hint} error={error}>
      <Select
        id={fieldId}
        options={options}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={cn(error ? 'border-danger' : 'border-control', className)}
        {...rest}
      />
    </Field>
  );
}

/** The bare control, for places where the label is given another way (aria-label in a table row). */
export function Select({
  options,
  className,
  ...rest
}: SelectHTMLAttributes<HTMLSelectElement> & { options: readonly SelectOption[]; ref?: Ref<HTMLSelectElement> }) {
  return (
    <select className={cn(controlClasses, 'border-control pr-8', className)} {...rest}>
      {options.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
    </select>
  );
}
