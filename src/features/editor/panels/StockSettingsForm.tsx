import { useState, type FormEvent } from 'react';
import type { DesignSettings } from '@/domain/design/schema';
import { formatLength, parseLength, type LengthUnit } from '@/domain/units';
import type { StockSettingsPatch } from './panelCommands';

const FIELDS: { key: keyof StockSettingsPatch; label: string; allowZero: boolean }[] = [
  { key: 'stockLength', label: 'Stock bar length', allowZero: false },
  { key: 'kerf', label: 'Saw kerf', allowZero: true },
  { key: 'endTrim', label: 'End trim, both ends', allowZero: true },
  { key: 'minReusableOffcut', label: 'Keep offcuts from', allowZero: true },
];

export interface StockSettingsFormProps {
  settings: DesignSettings;
  units: LengthUnit;
  onApply: (patch: StockSettingsPatch) => void;
}

function editable(mm: number, units: LengthUnit) {
  return units === 'in' ? formatLength(mm, 'in', { style: 'fraction', denominator: 32 }) : formatLength(mm, 'mm', { decimals: 1 });
}

/** Stock length, kerf, end trim and reusable-offcut threshold; lengths typed in the design's units. */
export function StockSettingsForm({ settings, units, onApply }: StockSettingsFormProps) {
  const [initialTexts] = useState<Record<string, string>>(() =>
    Object.fromEntries(FIELDS.map((field) => [field.key, editable(settings[field.key], units)])),
  );
  const [texts, setTexts] = useState(initialTexts);
  const [errors, setErrors] = useState<Record<string, string>>({});

  function submit(event: FormEvent) {
    event.preventDefault();
    const patch: StockSettingsPatch = {};
    const nextErrors: Record<string, string> = {};
    for (const field of FIELDS) {
      // An untouched field keeps its exact stored value (a rounded inch fraction would drift).
      if (texts[field.key] === initialTexts[field.key]) continue;
      const parsed = parseLength(texts[field.key] ?? '', units);
      if (!parsed.ok) nextErrors[field.key] = parsed.error;
      else if (parsed.mm < 0 || (!field.allowZero && parsed.mm === 0)) nextErrors[field.key] = field.allowZero ? 'Cannot be negative.' : 'Must be greater than zero.';
      else if (Math.abs(parsed.mm - settings[field.key]) > 1e-6) patch[field.key] = parsed.mm;
    }
    const length = patch.stockLength ?? settings.stockLength;
    const trim = patch.endTrim ?? settings.endTrim;
    if (!nextErrors.endTrim && !nextErrors.stockLength && trim >= length) nextErrors.endTrim = 'End trim leaves nothing of the bar to cut.';
    setErrors(nextErrors);
    if (Object.keys(nextErrors).length === 0 && Object.keys(patch).length > 0) onApply(patch);
  }

  return (
    <form onSubmit={submit} className="flex flex-wrap items-start gap-3" aria-label="Stock settings" noValidate>
      {FIELDS.map((field) => {
        const inputId = `stock-${field.key}`;
        const error = errors[field.key];
        return (
          <div key={field.key} className="flex flex-col gap-0.5">
            <label htmlFor={inputId} className="text-xs text-ink-soft">
              {field.label} ({units === 'in' ? 'in' : 'mm'})
            </label>
            <input
              id={inputId}
              inputMode="decimal"
              value={texts[field.key]}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? `${inputId}-error` : undefined}
              onChange={(event) => setTexts((current) => ({ ...current, [field.key]: event.target.value }))}
              className="min-h-[44px] w-32 rounded border border-paper-line bg-paper-raised px-2 text-right tabular-nums focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
            />
            {error && (
              <span id={`${inputId}-error`} role="alert" className="max-w-[10rem] text-xs text-severity-error">
                {error}
              </span>
            )}
          </div>
        );
      })}
      <button type="submit" className="mt-4 min-h-[44px] rounded bg-accent px-4 text-sm font-semibold text-accent-ink hover:bg-accent-strong focus-visible:outline focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent">
        Re-plan bars
      </button>
    </form>
  );
}
