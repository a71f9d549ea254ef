import { useId, type ReactNode, type Ref, type TextareaHTMLAttributes } from 'react';
import { cn } from '../lib/cn.ts';
import { Field, controlClasses, describedBy } from './field.tsx';

export interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> {
  label: string;
  hint?: ReactNode;
  error?: string;
  id?: string;
  ref?: Ref<HTMLTextAreaElement>;
}

/** A labelled multi-line text field (notes, a list of links one per line). */
export function TextAreaField({ label, hint, error, id, className, rows = 3, ...rest }: TextAreaFieldProps) {
  const autoId = useId();
  const fieldId = id ?? `f${autoId.replace(/:/g, '')}`;
  return (
    <Field id={fieldId} label={label} hint={hint} error={error}>
      <textarea
        id={fieldId}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={cn(controlClasses, 'py-2 leading-normal', error ? 'border-danger' : 'border-control', className)}
        {...rest}
      />
    </Field>
  );
}
