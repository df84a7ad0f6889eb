import type { MassSummary } from '@/domain/analysis/types';
import type { DesignDocument } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { FootprintSketch } from './FootprintSketch';
import { BOM_CATEGORY_NAMES } from './PartsTab';
import { showLength, showMass } from './format';

/** Mass by category, the centre of mass and the overall size, with a top-view sketch. */
export function WeightTab({ mass, design, units }: { mass: MassSummary; design?: DesignDocument; units: LengthUnit }) {
  const categories = Object.entries(mass.byCategory).filter(([, kg]) => kg > 0).sort(([, a], [, b]) => b - a);
  const [cx, cy, cz] = mass.centreOfMass;
  return (
    <div className="flex flex-wrap gap-6">
      <table className="text-sm">
        <caption className="pb-1 text-left text-sm font-semibold">Mass by category</caption>
        <tbody>
          {categories.map(([category, kg]) => (
            <tr key={category} className="border-b border-paper-line/60">
              <th scope="row" className="px-2 py-1 text-left font-normal">{BOM_CATEGORY_NAMES[category] ?? category}</th>
              <td className="px-2 py-1 text-right tabular-nums">{showMass(kg, units)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t-2 border-ink-soft font-semibold">
            <th scope="row" className="px-2 py-1 text-left">Total</th>
            <td className="px-2 py-1 text-right tabular-nums">{showMass(mass.total, units)}</td>
          </tr>
        </tfoot>
      </table>
      <dl className="grid grid-cols-[auto_auto] content-start gap-x-4 gap-y-1 text-sm">
        <dt className="font-semibold col-span-2">Overall size</dt>
        <dt className="text-ink-soft">Width (X)</dt>
        <dd className="text-right tabular-nums">{showLength(mass.overallSize.x, units)}</dd>
        <dt className="text-ink-soft">Height (Y)</dt>
        <dd className="text-right tabular-nums">{showLength(mass.overallSize.y, units)}</dd>
        <dt className="text-ink-soft">Depth (Z)</dt>
        <dd className="text-right tabular-nums">{showLength(mass.overallSize.z, units)}</dd>
        <dt className="col-span-2 pt-2 font-semibold">Centre of mass, from the frame's lowest corner</dt>
        <dt className="text-ink-soft">X</dt>
        <dd className="text-right tabular-nums">{showLength(cx - mass.boundingBox.min[0], units)}</dd>
        <dt className="text-ink-soft">Y (height)</dt>
        <dd className="text-right tabular-nums">{showLength(cy - mass.boundingBox.min[1], units)}</dd>
        <dt className="text-ink-soft">Z</dt>
        <dd className="text-right tabular-nums">{showLength(cz - mass.boundingBox.min[2], units)}</dd>
      </dl>
      <figure className="flex flex-col items-center">
        <FootprintSketch mass={mass} design={design} units={units} />
        <figcaption className="text-xs text-ink-muted">Seen from above</figcaption>
      </figure>
    </div>
  );
}
