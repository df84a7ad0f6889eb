import type { MassSummary } from '@/domain/analysis/types';
import type { DesignDocument } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { showLength } from './format';

const SIZE = 260;
const MARGIN = 30;

/** Top view (X across, Z down the page; Y is up in the model) with the centre of mass as a dot. */
export function FootprintSketch({ mass, design, units }: { mass: MassSummary; design?: DesignDocument; units: LengthUnit }) {
  const { min, max } = mass.boundingBox;
  const spanX = Math.max(max[0] - min[0], 1);
  const spanZ = Math.max(max[2] - min[2], 1);
  const scale = (SIZE - 2 * MARGIN) / Math.max(spanX, spanZ);
  const px = (x: number) => MARGIN + (x - min[0]) * scale;
  const pz = (z: number) => MARGIN + (z - min[2]) * scale;
  const width = spanX * scale;
  const depth = spanZ * scale;
  const [cx, , cz] = mass.centreOfMass;
  return (
    <svg role="img" aria-label={`Footprint ${showLength(spanX, units)} by ${showLength(spanZ, units)}, centre of mass marked`} viewBox={`0 0 ${SIZE} ${SIZE}`} className="h-64 w-64">
      <rect x={px(min[0])} y={pz(min[2])} width={width} height={depth} fill="#f6f7f5" stroke="#5d6873" strokeDasharray="4 3" />
      {design?.profiles.map((profile) => {
        const [sx, , sz] = profile.start;
        const ex = sx + profile.direction[0] * profile.length;
        const ez = sz + profile.direction[2] * profile.length;
        if (Math.abs(profile.direction[1]) > 0.99) {
          return <rect key={profile.id} x={px(sx) - 3} y={pz(sz) - 3} width={6} height={6} fill="#b9c0c6" stroke="#3c4650" />;
        }
        return <line key={profile.id} x1={px(sx)} y1={pz(sz)} x2={px(ex)} y2={pz(ez)} stroke="#b9c0c6" strokeWidth={4} strokeLinecap="square" />;
      })}
      <circle data-kind="centre-of-mass" cx={px(cx)} cy={pz(cz)} r={5} fill="#0b7a75" stroke="#fff" strokeWidth={1.5} />
      <text x={px(cx) > SIZE / 2 ? px(cx) - 8 : px(cx) + 8} y={pz(cz) - 8} textAnchor={px(cx) > SIZE / 2 ? 'end' : 'start'} fontSize="10" fill="#075b57">
        centre of mass
      </text>
      <text x={px(min[0]) + width / 2} y={pz(min[2]) - 8} textAnchor="middle" fontSize="10" fill="#3c4650">
        {showLength(spanX, units)} (X)
      </text>
      <text x={px(min[0]) - 8} y={pz(min[2]) + depth / 2} textAnchor="middle" fontSize="10" fill="#3c4650" transform={`rotate(-90 ${px(min[0]) - 8} ${pz(min[2]) + depth / 2})`}>
        {showLength(spanZ, units)} (Z)
      </text>
    </svg>
  );
}
