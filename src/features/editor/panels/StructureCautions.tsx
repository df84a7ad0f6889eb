import { TriangleAlert } from 'lucide-react';

/** The standing cautions for every structural estimate (product and domain briefs). */
export const STRUCTURE_CAUTIONS = [
  'These are estimates from simple beam and column formulas, not a design check.',
  'Shear deflection is neglected; it is small at these spans.',
  'Limits used: deflection span/360 and stress below yield divided by 2.0 are common practice, not a code requirement.',
  "Defer to the supplier's published data, local codes and a qualified engineer before anyone relies on this frame.",
];

/** The standing cautions always show; the analysis's own assumptions sit under a disclosure beneath them. */
export function StructureCautions({ extra = [] }: { extra?: string[] }) {
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
