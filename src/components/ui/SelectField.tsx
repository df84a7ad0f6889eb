import type { ComponentProps } from 'react';
import { cn } from '@/lib/cn';
import { Field, controlClasses, describedBy } from './Field';

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectFieldProps extends Omit<ComponentProps<'select'>, 'id'> {
  id: string;
  label: string;
  options: readonly SelectOption[];
  error?: string;
  hint?: string;
}

/** A labelled native select (keyboard and touch friendly) with its error beside it. */
export function SelectField({ id, label, options, error, hint, className, ...selectProps }: SelectFieldProps) {
  return (
    <Field id={id} label={label} error={error} hint={hint}>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className={cn(controlClasses, 'pr-8', className)}
        {...selectProps}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </Field>
  );
}
