import { useId, useState, type KeyboardEvent } from 'react';
import { formatLength, parseLength } from '@/domain/units';
import { cn } from '@/lib/cn';
import type { DisplayUnits } from '../store/types';

export interface LengthInputProps {
  label: string;
  /** The value in mm (what the design holds). */
  valueMm: number;
  units: DisplayUnits;
  /** Called once on Enter or blur with a valid, changed value in mm; returns a message when the edit is refused. */
  onCommit: (mm: number) => string | null | void;
  /** Which values are acceptable: 'positive' (lengths), 'non-negative', or 'any' (coordinates). */
  accept?: 'positive' | 'non-negative' | 'any';
  /** Extra rule after parsing; returns a reason to refuse or null. */
  validate?: (mm: number) => string | null;
  hint?: string;
  compact?: boolean;
}

/** A length typed in the person's units (inch fractions or mm); refused input says why beside the field and changes nothing. */
export function LengthInput({ label, valueMm, units, onCommit, accept = 'positive', validate, hint, compact }: LengthInputProps) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const shown = draft ?? formatLength(valueMm, units);

  const commit = () => {
    if (draft === null) return;
    const parsed = parseLength(draft, units);
    if (!parsed.ok) return setError(parsed.error);
    const mm = parsed.mm;
    if (accept === 'positive' && mm <= 0) return setError(mm === 0 ? `${label} must be more than zero.` : `${label} cannot be negative.`);
    if (accept === 'non-negative' && mm < 0) return setError(`${label} cannot be negative.`);
    const reason = validate?.(mm) ?? null;
    if (reason) return setError(reason);
    if (Math.abs(mm - valueMm) < 1e-9) {
      setDraft(null);
      setError(null);
      return;
    }
    const refused = onCommit(mm);
    if (refused) return setError(refused);
    setDraft(null);
    setError(null);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key === 'Enter') {
      event.preventDefault();
      commit();
    } else if (event.key === 'Escape' && draft !== null) {
      event.preventDefault();
      event.stopPropagation();
      setDraft(null);
      setError(null);
    }
  };

  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  return (
    <div className={cn('flex flex-col gap-1', compact && 'min-w-0')}>
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        value={shown}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : hint ? hintId : undefined}
        onChange={(event) => {
          setDraft(event.target.value);
          if (error) setError(null);
        }}
        onBlur={commit}
        onKeyDown={onKeyDown}
        className={cn(
          'min-h-11 w-full rounded-lg border border-paper-line bg-paper-raised text-right text-sm tabular-nums text-ink focus-ring',
          compact ? 'px-1.5' : 'px-2.5',
          'aria-[invalid=true]:border-severity-error aria-[invalid=true]:bg-severity-error-soft/40',
        )}
      />
      {error ? (
        <p id={errorId} role="alert" className="text-xs text-severity-error">
          <span className="font-semibold">Not changed: </span>
          {error}
        </p>
      ) : hint ? (
        <p id={hintId} className="text-xs text-ink-muted">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
