import { useId, type ReactElement } from 'react';
import type { StockPlan } from '@/domain/outputs/stockPlan';
import type { LengthUnit } from '@/domain/units';
import { showLength, variantName } from './format';

export interface StockPlanPictureProps {
  variantId: string;
  plan: StockPlan;
  stockLength: number;
  kerf: number;
  endTrim: number;
  units: LengthUnit;
}

const VIEW_WIDTH = 1000;
const BAR_HEIGHT = 26;
const ROW_GAP = 14;
const LEFT_GUTTER = 44;

/** Each stock bar drawn to scale: end trim, cuts with labels, kerf slivers, and the hatched offcut. */
export function StockPlanPicture({ variantId, plan, stockLength, kerf, endTrim, units }: StockPlanPictureProps) {
  const hatchId = `hatch-${useId().replace(/:/g, '')}`;
  const scale = (VIEW_WIDTH - LEFT_GUTTER) / Math.max(stockLength, 1);
  const height = plan.bars.length * (BAR_HEIGHT + ROW_GAP) + ROW_GAP;
  return (
    <svg
      role="img"
      aria-label={`Stock plan for ${variantName(variantId)}: ${plan.barCount} bars of ${showLength(stockLength, units)}`}
      viewBox={`0 0 ${VIEW_WIDTH} ${height}`}
      className="w-full"
      data-variant={variantId}
    >
      <defs>
        <pattern id={hatchId} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="6" height="6" fill="#eceeeb" />
          <line x1="0" y1="0" x2="0" y2="6" stroke="#5d6873" strokeWidth="2" />
        </pattern>
      </defs>
      {plan.bars.map((bar, row) => {
        const top = ROW_GAP + row * (BAR_HEIGHT + ROW_GAP);
        const x = (mm: number) => LEFT_GUTTER + Math.min(mm, stockLength) * scale;
        const pieces: ReactElement[] = [];
        let cursor = 0;
        // endTrim is the total squared off both ends (stockPlan.ts), so half is drawn at each end.
        if (endTrim > 0) {
          pieces.push(<rect key="trim-start" data-kind="trim" x={x(0)} y={top} width={(endTrim / 2) * scale} height={BAR_HEIGHT} fill="#3c4650" />);
          cursor = endTrim / 2;
        }
        bar.cuts.forEach((cut, index) => {
          const start = cursor;
          const width = Math.max(0, Math.min(cut.length, stockLength - start)) * scale;
          const label = cut.label ? `${cut.label} ${showLength(cut.length, units)}` : showLength(cut.length, units);
          pieces.push(
            <g key={`cut-${cut.id}-${index}`} data-kind="cut" data-cut-id={cut.id}>
              <title>{label}</title>
              <rect x={x(start)} y={top} width={width} height={BAR_HEIGHT} fill="#b9c0c6" stroke="#1d2329" strokeWidth="0.75" />
              {width > label.length * 6.5 && (
                <text x={x(start) + width / 2} y={top + BAR_HEIGHT / 2 + 4} textAnchor="middle" fontSize="11" fill="#1d2329">
                  {label}
                </text>
              )}
            </g>,
          );
          cursor = start + cut.length;
          if (kerf > 0 && cursor < stockLength) {
            pieces.push(
              <rect key={`kerf-${index}`} data-kind="kerf" x={x(cursor)} y={top - 3} width={Math.max(kerf * scale, 1)} height={BAR_HEIGHT + 6} fill="#b42318" />,
            );
            cursor += kerf;
          }
        });
        const offcutWidth = Math.max(0, Math.min(bar.offcut, stockLength - cursor));
        if (offcutWidth > 0) {
          const offcutLabel = `${bar.reusable ? 'reusable ' : ''}offcut ${showLength(bar.offcut, units)}`;
          pieces.push(
            <g key="offcut" data-kind="offcut" data-reusable={bar.reusable ? 'true' : 'false'}>
              <title>{offcutLabel}</title>
              <rect x={x(cursor)} y={top} width={offcutWidth * scale} height={BAR_HEIGHT} fill={`url(#${hatchId})`} stroke={bar.reusable ? '#0b7a75' : '#5d6873'} strokeWidth={bar.reusable ? 2 : 0.75} />
              {offcutWidth * scale > offcutLabel.length * 6.5 && (
                <text x={x(cursor) + (offcutWidth * scale) / 2} y={top + BAR_HEIGHT / 2 + 4} textAnchor="middle" fontSize="11" fill="#1d2329" fontWeight={bar.reusable ? 600 : 400}>
                  {offcutLabel}
                </text>
              )}
            </g>,
          );
          cursor += offcutWidth;
        }
        if (stockLength - cursor > 0.5) {
          pieces.push(<rect key="trim-end" data-kind="trim" x={x(cursor)} y={top} width={(stockLength - cursor) * scale} height={BAR_HEIGHT} fill="#3c4650" />);
        }
        return (
          <g key={bar.index} data-kind="bar" aria-label={`Bar ${row + 1}: ${bar.cuts.length} cuts, offcut ${showLength(bar.offcut, units)}${bar.reusable ? ', reusable' : ''}`}>
            <text x={LEFT_GUTTER - 8} y={top + BAR_HEIGHT / 2 + 4} textAnchor="end" fontSize="12" fill="#3c4650" className="tabular-nums">
              {row + 1}
            </text>
            <rect x={x(0)} y={top} width={stockLength * scale} height={BAR_HEIGHT} fill="none" stroke="#1d2329" strokeWidth="1" />
            {pieces}
          </g>
        );
      })}
    </svg>
  );
}
