/**
 * Connectors per system: inside corner bracket, gusset plate, concealed end connector, end screw,
 * three-way corner cube and pivot hinge. Machining figures (counterbore diameter and distance,
 * access hole) are Slotwise demo values of common practice, no source: always check the
 * connector supplier's instructions. Masses are estimates; prices are demo prices, invented.
 */
import { threadFor } from './fastenerStandards';
import { fastenerId } from './fasteners';
import { SYSTEM_PREFIX, systemPartCode } from './systems';
import type { Connector, ProfileSystem } from './types';

const INCH = 25.4;

interface SystemHardware {
  /** Screw length for brackets, gussets and hinges (T-nut screws), mm. */
  slotScrewLength: number;
  /** Screw length for concealed connectors and corner cubes (into the tapped end), mm. */
  endScrewShortLength: number;
  /** Screw length for end screws (through the met profile into the tapped end), mm. */
  endScrewLongLength: number;
  /** Concealed connector access counterbore diameter, mm. */
  counterboreDiameter: number;
  /** Access hole diameter for end screws (hex key access), mm. */
  accessHoleDiameter: number;
  /** Price factor relative to the 40 mm system (demo). */
  priceFactor: number;
}

const hardware: Record<ProfileSystem['id'], SystemHardware> = {
  'inch-1.0': { slotScrewLength: 0.5 * INCH, endScrewShortLength: 0.75 * INCH, endScrewLongLength: 1.5 * INCH, counterboreDiameter: 7.9, accessHoleDiameter: 7.9, priceFactor: 0.8 },
  'inch-1.5': { slotScrewLength: 0.625 * INCH, endScrewShortLength: 1 * INCH, endScrewLongLength: 2.25 * INCH, counterboreDiameter: 9.5, accessHoleDiameter: 9.5, priceFactor: 1.05 },
  'metric-20': { slotScrewLength: 10, endScrewShortLength: 16, endScrewLongLength: 30, counterboreDiameter: 6.5, accessHoleDiameter: 6, priceFactor: 0.6 },
  'metric-30': { slotScrewLength: 12, endScrewShortLength: 20, endScrewLongLength: 45, counterboreDiameter: 8, accessHoleDiameter: 7, priceFactor: 0.8 },
  'metric-40': { slotScrewLength: 16, endScrewShortLength: 30, endScrewLongLength: 60, counterboreDiameter: 10, accessHoleDiameter: 8, priceFactor: 1 },
  'metric-45': { slotScrewLength: 16, endScrewShortLength: 35, endScrewLongLength: 65, counterboreDiameter: 10, accessHoleDiameter: 10, priceFactor: 1.15 },
};

const money = (v: number) => Math.round(v * 100) / 100;

export function buildConnectors(systems: ProfileSystem[]): Connector[] {
  const out: Connector[] = [];
  for (const s of systems) {
    const p = SYSTEM_PREFIX[s.id];
    const code = `SW-${systemPartCode(s.id)}`;
    const hw = hardware[s.id];
    const k = hw.priceFactor;
    const size = s.outerSize;
    // Mass scales with the cube of the profile size relative to 40 mm (estimate).
    const m = (kg40: number) => Math.round(kg40 * (size / 40) ** 3 * 1000) / 1000;
    const slotScrew = fastenerId('button', s.screwSize, hw.slotScrewLength);
    const shortEndScrew = fastenerId('socket', s.endTapSize, hw.endScrewShortLength);
    const longEndScrew = fastenerId('socket', s.endTapSize, hw.endScrewLongLength);
    const tapDrill = s.centreBoreDiameter;
    const tap = s.endTapSize;
    const common = { systemIds: [s.id] };
    out.push(
      {
        ...common,
        id: `${p}-corner-bracket`,
        partCode: `${code}-BRK-IN`,
        kind: 'corner-bracket',
        name: `Inside corner bracket, ${s.name}`,
        unitMass: m(0.045),
        price: money(2.4 * k),
        fasteners: [{ fastenerId: slotScrew, quantity: 2 }],
        tNutCount: 2,
        machining: [],
        occupiedSlotLength: round1(size * 0.9),
      },
      {
        ...common,
        id: `${p}-gusset-plate`,
        partCode: `${code}-GUS-L`,
        kind: 'gusset-plate',
        name: `Gusset plate, L, ${s.name}`,
        unitMass: m(0.11),
        price: money(4.9 * k),
        fasteners: [{ fastenerId: slotScrew, quantity: 4 }],
        tNutCount: 4,
        machining: [],
        occupiedSlotLength: round1(size * 2),
        plate: { width: round1(size * 2), height: round1(size * 2), thickness: round1(Math.max(3, size * 0.1)) },
      },
      {
        ...common,
        id: `${p}-concealed-connector`,
        partCode: `${code}-CON-HID`,
        kind: 'concealed-connector',
        name: `Concealed end connector, ${s.name}`,
        unitMass: m(0.03),
        price: money(3.1 * k),
        fasteners: [{ fastenerId: shortEndScrew, quantity: 1 }],
        tNutCount: 0,
        machining: [
          { kind: 'access-counterbore', on: 'joined', offsetFromEnd: round1(size / 2), diameter: hw.counterboreDiameter },
        ],
        occupiedSlotLength: round1(size * 0.3),
        accessCounterbore: { diameter: hw.counterboreDiameter, distanceFromEnd: round1(size / 2) },
      },
      {
        ...common,
        id: `${p}-end-screw`,
        partCode: `${code}-SCR-END`,
        kind: 'end-screw',
        name: `End screw joint, ${s.name} (${threadFor(tap).designation})`,
        unitMass: 0,
        price: 0,
        fasteners: [{ fastenerId: longEndScrew, quantity: 1 }],
        tNutCount: 0,
        machining: [
          { kind: 'end-tap', on: 'joined', offsetFromEnd: 0, diameter: tapDrill, tapSize: tap },
          { kind: 'access-hole', on: 'met', offsetFromEnd: 0, diameter: hw.accessHoleDiameter },
        ],
        occupiedSlotLength: 0,
        endScrew: { tapSize: tap, tapDrillDiameter: tapDrill, accessHoleDiameter: hw.accessHoleDiameter },
      },
      {
        ...common,
        id: `${p}-corner-cube`,
        partCode: `${code}-CUBE-3W`,
        kind: 'corner-cube',
        name: `Three-way corner cube, ${s.name}`,
        unitMass: m(0.14),
        price: money(5.6 * k),
        fasteners: [{ fastenerId: shortEndScrew, quantity: 3 }],
        tNutCount: 0,
        machining: [{ kind: 'end-tap', on: 'each-end', offsetFromEnd: 0, diameter: tapDrill, tapSize: tap }],
        occupiedSlotLength: 0,
      },
      {
        ...common,
        id: `${p}-pivot-hinge`,
        partCode: `${code}-HNG-PVT`,
        kind: 'hinge',
        name: `Pivot hinge, ${s.name}`,
        unitMass: m(0.09),
        price: money(6.8 * k),
        fasteners: [{ fastenerId: slotScrew, quantity: 4 }],
        tNutCount: 4,
        machining: [],
        occupiedSlotLength: round1(size * 1.1),
      },
    );
  }
  return out;
}

function round1(v: number): number {
  return Math.round(v * 10) / 10;
}
