import { TriangleAlert } from 'lucide-react';

/** The limits in force, from the design's settings (they change when the settings do). */
export function limitsCaution(settings: { deflectionLimitRatio: number; safetyFactor: number }): string {
  return `Limits in force: deflection span/${formatSetting(settings.deflectionLimitRatio)} and stress below yield divided by ${formatSetting(settings.safetyFactor)} (common practice, not a code requirement).`;
}

/** The standing cautions for every structural estimate (product and domain briefs). */
export function structureCautionLines(settings: { deflectionLimitRatio: number; safetyFactor: number }): string[] {
  return [
    'These are estimates from simple beam and column formulas, not a design check.',
    'Shear deflection is neglected; it is small at these spans.',
    limitsCaution(settings),
    'Not checked: local buckling of thin walls, fatigue and vibration, impact, joint moments, screws pulling out, and the floor under the feet.',
    "Defer to the supplier's published data, local codes and a qualified engineer before anyone relies on this frame.",
  ];
}

function formatSetting(value: number): string {
  return Number.isInteger(value) ? value.toFixed(Math.abs(value) < 10 ? 1 : 0) : String(Math.round(value * 100) / 100);
}

/** The standing cautions always show; the analysis's own assumptions sit under a disclosure beneath them. */
export function StructureCautions({ extra = [], settings = { deflectionLimitRatio: 360, safetyFactor: 2 } }: { extra?: string[]; settings?: { deflectionLimitRatio: number; safetyFactor: number } }) {
  const STRUCTURE_CAUTIONS = structureCautionLines(settings);
  const assumptions = extra.filter((line) => !STRUCTURE_CAUTIONS.includes(line));
  return (
    <aside aria-label="Cautions" className="rounded border border-severity-warning/40 bg-severity-warning-soft p-3 text-sm text-ink">
      <p className="mb-1 flex items-center gap-1.5 font-semibold text-severity-warning">
        <TriangleAlert aria-hidden="true" className="h-4 w-4" />
        Caution: estimates only
      </p>
      <ul className="list-disc pl-5">
        {STRUCTURE_CAUTIONS.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      {assumptions.length > 0 && (
        <details className="mt-1">
          <summary className="cursor-pointer text-ink-soft">Assumptions behind these numbers ({assumptions.length})</summary>
          <ul className="list-disc pl-5">
            {assumptions.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        </details>
      )}
    </aside>
  );
}
