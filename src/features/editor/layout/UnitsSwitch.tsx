import { cn } from '@/lib/cn';
import type { DisplayUnits } from '../store/types';

/** Millimetres or inches: a two-way switch; the choice is saved to the person's preferences by the caller. */
export function UnitsSwitch({ units, onChange }: { units: DisplayUnits; onChange: (units: DisplayUnits) => void }) {
  const options: { value: DisplayUnits; label: string; title: string }[] = [
    { value: 'mm', label: 'mm', title: 'Show lengths in millimetres' },
    { value: 'in', label: 'in', title: 'Show lengths in inches (fractions to 1/32)' },
  ];
  return (
    <div role="radiogroup" aria-label="Display units" className="flex rounded-lg border border-paper-line bg-paper-sunk p-0.5">
      {options.map((option) => (
        <button
          key={option.value}
          type="button"
          role="radio"
          aria-checked={units === option.value}
          title={option.title}
          onClick={() => onChange(option.value)}
          className={cn(
            'min-h-10 min-w-11 rounded-md px-2 text-sm font-medium tabular-nums focus-ring',
            units === option.value ? 'bg-paper-raised text-ink shadow-sm' : 'text-ink-muted hover:text-ink',
          )}
        >
          {option.label}
        </button>
      ))}
    </div>
  );
}
