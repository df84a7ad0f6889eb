import { ErrorNotice } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { useUnits, type Units } from '@/lib/session/useUnits';
import { Section } from './Section';

const OPTIONS: { value: Units; label: string; example: string }[] = [
  { value: 'mm', label: 'Millimetres', example: 'e.g. 1 220 mm' },
  { value: 'in', label: 'Inches', example: 'e.g. 48 1/32 in' },
];

/** Saved as soon as it changes; lengths are stored in millimetres either way, this only changes how they are shown. */
export function UnitsPreference() {
  const { units, setUnits, isSaving, error } = useUnits();
  return (
    <Section id="account-units" title="Units" description="How lengths are shown and typed. Designs are stored exactly either way (25.4 mm per inch).">
      <fieldset aria-describedby="account-units-status">
        <legend className="sr-only">Length units</legend>
        <div className="flex flex-wrap gap-2">
          {OPTIONS.map((option) => (
            <label
              key={option.value}
              className="flex min-h-11 min-w-48 flex-1 cursor-pointer items-center gap-3 rounded-lg border border-paper-line px-3 py-2 has-[:checked]:border-accent has-[:checked]:bg-accent-soft has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-accent"
            >
              <input
                type="radio"
                name="units"
                value={option.value}
                checked={units === option.value}
                onChange={() => setUnits(option.value)}
                className="size-4 accent-[#0b7a75]"
              />
              <span className="flex flex-col">
                <span className="text-sm font-medium text-ink">{option.label}</span>
                <span className="text-xs text-ink-muted tabular-nums">{option.example}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      <p id="account-units-status" role="status" className="text-sm text-ink-muted">
        {isSaving ? 'Saving…' : ''}
      </p>
      {error ? <ErrorNotice title="Units not saved" message={messageOf(error)} /> : null}
    </Section>
  );
}
