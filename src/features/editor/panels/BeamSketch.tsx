import { useId } from 'react';
import type { LengthUnit } from '@/domain/units';
import { deflectedShape, type SketchLoad, type SketchSupport } from './deflectedShape';
import { showLength, showSmallLength } from '@/components/outputs/format';

export interface BeamSketchProps {
  span: number;
  support: SketchSupport;
  load: SketchLoad;
  /** mm, from the analysis. */
  maxDeflection: number;
  forceLabel: string;
  units: LengthUnit;
}

const WIDTH = 480;
const HEIGHT = 170;
const LEFT = 40;
const RIGHT = WIDTH - 40;
const BEAM_Y = 70;
const SHAPE_AMPLITUDE = 34; // px the deflected shape is drawn at, whatever the real deflection

/** The loaded member as a sketch: supports, load arrow(s), and the deflected shape exaggerated to be visible. */
export function BeamSketch({ span, support, load, maxDeflection, forceLabel, units }: BeamSketchProps) {
  const markerId = `arrow-${useId().replace(/:/g, '')}`;
  const hatchId = `wall-${useId().replace(/:/g, '')}`;
  const pxPerMm = (RIGHT - LEFT) / Math.max(span, 1);
  const x = (mm: number) => LEFT + mm * pxPerMm;
  const shape = deflectedShape(span, support, load);
  const curve = shape.map(([mm, y]) => `${x(mm).toFixed(1)},${(BEAM_Y + y * SHAPE_AMPLITUDE).toFixed(1)}`).join(' ');
  const exaggeration = maxDeflection > 0 ? SHAPE_AMPLITUDE / (maxDeflection * pxPerMm) : 0;
  const peak = shape.reduce((best, point) => (point[1] > best[1] ? point : best), shape[0]);
  return (
    <svg role="img" aria-label={`Sketch: ${support === 'simple' ? 'simply supported' : 'fixed-end'} span of ${showLength(span, units)}, ${forceLabel}, deflected shape exaggerated`} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="w-full max-w-xl">
      <defs>
        <marker id={markerId} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto">
          <path d="M0,0 L10,5 L0,10 z" fill="#b42318" />
        </marker>
        <pattern id={hatchId} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1="0" y1="0" x2="0" y2="6" stroke="#3c4650" strokeWidth="1.5" />
        </pattern>
      </defs>
      <line data-kind="beam" x1={LEFT} y1={BEAM_Y} x2={RIGHT} y2={BEAM_Y} stroke="#5d6873" strokeWidth="6" strokeLinecap="butt" opacity="0.35" />
      {support === 'simple' ? (
        <g data-kind="supports">
          <path d={`M${LEFT},${BEAM_Y + 3} l-10,18 h20 z`} fill="#fff" stroke="#1d2329" />
          <circle cx={RIGHT} cy={BEAM_Y + 12} r="8" fill="#fff" stroke="#1d2329" />
          <line x1={LEFT - 16} y1={BEAM_Y + 22} x2={RIGHT + 16} y2={BEAM_Y + 22} stroke="#1d2329" strokeDasharray="2 6" opacity="0.4" />
        </g>
      ) : (
        <g data-kind="supports">
          <rect x={LEFT - 14} y={BEAM_Y - 30} width="14" height="60" fill={`url(#${hatchId})`} stroke="#1d2329" />
          <rect x={RIGHT} y={BEAM_Y - 30} width="14" height="60" fill={`url(#${hatchId})`} stroke="#1d2329" />
        </g>
      )}
      {load.kind === 'point' ? (
        <g data-kind="load">
          <line x1={x(load.at)} y1={BEAM_Y - 52} x2={x(load.at)} y2={BEAM_Y - 6} stroke="#b42318" strokeWidth="2.5" markerEnd={`url(#${markerId})`} />
          <text x={x(load.at)} y={BEAM_Y - 56} textAnchor="middle" fontSize="12" fill="#b42318">
            {forceLabel}
          </text>
        </g>
      ) : (
        <g data-kind="load">
          <line x1={LEFT} y1={BEAM_Y - 34} x2={RIGHT} y2={BEAM_Y - 34} stroke="#b42318" strokeWidth="1.5" />
          {Array.from({ length: 9 }, (_, i) => LEFT + ((RIGHT - LEFT) * i) / 8).map((ax) => (
            <line key={ax} x1={ax} y1={BEAM_Y - 34} x2={ax} y2={BEAM_Y - 7} stroke="#b42318" strokeWidth="1.5" markerEnd={`url(#${markerId})`} />
          ))}
          <text x={(LEFT + RIGHT) / 2} y={BEAM_Y - 40} textAnchor="middle" fontSize="12" fill="#b42318">
            {forceLabel}, spread evenly
          </text>
        </g>
      )}
      <polyline data-kind="deflected-shape" points={curve} fill="none" stroke="#0b7a75" strokeWidth="2.5" />
      <text x={x(peak[0])} y={BEAM_Y + SHAPE_AMPLITUDE + 16} textAnchor="middle" fontSize="11" fill="#075b57">
        {`max ${showSmallLength(maxDeflection, units)}`}
        {exaggeration > 1 ? ` · drawn ×${Math.round(exaggeration)}` : ''}
      </text>
      <line x1={LEFT} y1={HEIGHT - 18} x2={RIGHT} y2={HEIGHT - 18} stroke="#3c4650" />
      <line x1={LEFT} y1={HEIGHT - 24} x2={LEFT} y2={HEIGHT - 12} stroke="#3c4650" />
      <line x1={RIGHT} y1={HEIGHT - 24} x2={RIGHT} y2={HEIGHT - 12} stroke="#3c4650" />
      <text x={(LEFT + RIGHT) / 2} y={HEIGHT - 4} textAnchor="middle" fontSize="11" fill="#3c4650">
        span {showLength(span, units)}
      </text>
      <text x={WIDTH - 4} y={14} textAnchor="end" fontSize="10" fill="#5d6873">
        deflected shape exaggerated
      </text>
    </svg>
  );
}
