import type { ComponentProps } from 'react';
import { cn } from '@/lib/cn';
import { Field, controlClasses, describedBy } from './Field';

export interface TextFieldProps extends Omit<ComponentProps<'input'>, 'id'> {
  id: string;
  label: string;
  error?: string;
  hint?: string;
}

/** A labelled text input with its error beside it; works with react-hook-form's register(). */
export function TextField({ id, label, error, hint, className, ...inputProps }: TextFieldProps) {
  return (
    <Field id={id} label={label} error={error} hint={hint}>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className={cn(controlClasses, className)}
        {...inputProps}
      />
    </Field>
  );
}
