import type { CostCategory, CostSummary } from '@/domain/analysis/types';
import type { LengthUnit } from '@/domain/units';
import { BOM_CATEGORY_NAMES } from './PartsTab';
import { formatMoney, showQuantity, showUnitPrice } from './format';

const ORDER: CostCategory[] = ['profile', 'cutting', 'machining', 'connector', 'fastener', 't-nut', 'panel', 'accessory', 'gasket', 'slot-cover'];

/** Price lines by category with subtotals and a total; always labelled as demo prices. */
export function PriceTab({ cost, units }: { cost: CostSummary; units: LengthUnit }) {
  const categories = ORDER.filter((category) => cost.lines.some((line) => line.category === category)).concat(
    [...new Set(cost.lines.map((line) => line.category))].filter((category) => !ORDER.includes(category)),
  );
  return (
    <div className="flex flex-col gap-2">
      <p role="note" className="rounded bg-severity-note-soft px-2 py-1 text-sm text-severity-note">
        Demo prices ({cost.currency}), invented for this example shop. Not a quote.
      </p>
      <table className="w-full text-sm">
        <caption className="sr-only">Price lines</caption>
        <thead>
          <tr className="border-b border-paper-line text-ink-soft">
            <th scope="col" className="px-2 py-1 text-left font-medium">Code</th>
            <th scope="col" className="px-2 py-1 text-left font-medium">Description</th>
            <th scope="col" className="px-2 py-1 text-right font-medium">Qty</th>
            <th scope="col" className="px-2 py-1 text-right font-medium">Unit price</th>
            <th scope="col" className="px-2 py-1 text-right font-medium">Line price</th>
          </tr>
        </thead>
        {categories.map((category) => (
          <tbody key={category}>
            {cost.lines
              .filter((line) => line.category === category)
              .map((line, index) => (
                <tr key={`${line.code}-${index}`} className="border-b border-paper-line/60">
                  <td className="px-2 py-1"><code className="text-xs">{line.code}</code></td>
                  <td className="px-2 py-1">{line.description}</td>
                  <td className="px-2 py-1 text-right tabular-nums whitespace-nowrap">{showQuantity(line.quantity, line.unit, units)}</td>
                  <td className="px-2 py-1 text-right tabular-nums whitespace-nowrap">{showUnitPrice(line.unitPrice, line.unit, units)}</td>
                  <td className="px-2 py-1 text-right tabular-nums whitespace-nowrap">{formatMoney(line.linePrice)}</td>
                </tr>
              ))}
            <tr className="bg-paper-sunk">
              <th scope="row" colSpan={4} className="px-2 py-1 text-left text-xs font-semibold">
                Subtotal · {BOM_CATEGORY_NAMES[category] ?? category}
              </th>
              <td className="px-2 py-1 text-right tabular-nums font-semibold">{formatMoney(cost.subtotalByCategory[category] ?? 0)}</td>
            </tr>
          </tbody>
        ))}
        <tfoot>
          <tr className="border-t-2 border-ink-soft font-semibold">
            <th scope="row" colSpan={4} className="px-2 py-1 text-left">Total (demo prices)</th>
            <td className="px-2 py-1 text-right tabular-nums" data-testid="price-total">{formatMoney(cost.total)}</td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
