import type { ReactNode } from 'react';

export interface FieldProps {
  id: string;
  label: string;
  error?: string;
  hint?: string;
  /** The control; it must carry the same `id` and `aria-describedby={describedBy(id, error, hint)}`. */
  children: ReactNode;
}

/** Label above, control, then either the error (beside the field, in words and colour) or a hint. */
export function Field({ id, label, error, hint, children }: FieldProps) {
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      {children}
      {error ? (
        <p id={`${id}-error`} className="text-sm text-severity-error" role="alert">
          <span className="font-semibold">Error: </span>
          {error}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

export function describedBy(id: string, error?: string, hint?: string): string | undefined {
  if (error) return `${id}-error`;
  if (hint) return `${id}-hint`;
  return undefined;
}

export const controlClasses =
  'min-h-11 w-full rounded-lg border bg-paper-raised px-3 text-base text-ink placeholder:text-ink-muted focus-ring aria-[invalid=true]:border-severity-error border-paper-line';
