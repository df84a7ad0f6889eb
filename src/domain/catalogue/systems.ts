/**
 * The six profile systems. Slot openings are common practice, approximate, no single source
 * (domain brief); lip, chamber, depth, bore and engagement figures are our own drawing of a
 * typical profile of that size, also approximate. Stock lengths are demo values, invented.
 */
import type { ProfileSystem, SystemId } from './types';

/**
 * Short code used in ids and part codes, e.g. 'm40' / 'M40'. Inch systems are named by their
 * nominal size ('in1', 'in1.5'); schema version 2 renamed the older inch ids (see
 * `design/migrations.ts`, `LEGACY_INCH_PREFIXES`).
 */
export const SYSTEM_PREFIX: Record<SystemId, string> = {
  'inch-1.0': 'in1',
  'inch-1.5': 'in1.5',
  'metric-20': 'm20',
  'metric-30': 'm30',
  'metric-40': 'm40',
  'metric-45': 'm45',
};

export function systemPartCode(systemId: SystemId): string {
  return SYSTEM_PREFIX[systemId].replace('.', '').toUpperCase();
}

const SOURCE =
  'Outer size and slot opening: common practice, approximate, no single source. Other slot figures: Slotwise drawing, approximate. Check the supplier\u2019s data.';

type SystemFigures = Omit<ProfileSystem, 'tNutIds' | 'defaultVariantId' | 'defaultConnectorId' | 'source'>;

const figures: SystemFigures[] = [
  {
    id: 'inch-1.0',
    name: '1 in square',
    unitFamily: 'inch',
    outerSize: 25.4,
    slotOpening: 6.6, // about 0.26 in
    slotLipThickness: 2.7,
    slotChamberWidth: 14,
    slotDepth: 8,
    slotEngagement: 4.5,
    centreBoreDiameter: 5.1, // #7 drill, tap drill for 1/4-20 (common practice)
    endTapSize: '1/4',
    screwSize: '1/4',
    alloyId: '6063-T5',
    demoStockLength: 3658, // 12 ft demo bar
  },
  {
    id: 'inch-1.5',
    name: '1.5 in square',
    unitFamily: 'inch',
    outerSize: 38.1,
    slotOpening: 8.1, // about 0.32 in
    slotLipThickness: 2.6,
    slotChamberWidth: 19,
    slotDepth: 11.5,
    slotEngagement: 6.5,
    centreBoreDiameter: 6.5, // letter F drill, tap drill for 5/16-18 (common practice)
    endTapSize: '5/16',
    screwSize: '5/16',
    alloyId: '6063-T5',
    demoStockLength: 3658,
  },
  {
    id: 'metric-20',
    name: 'Metric 20 mm',
    unitFamily: 'metric',
    outerSize: 20,
    slotOpening: 6,
    slotLipThickness: 1.8,
    slotChamberWidth: 11,
    slotDepth: 6.2,
    slotEngagement: 4,
    centreBoreDiameter: 4.2, // M5 tap drill (common practice)
    endTapSize: 'M5',
    screwSize: 'M5',
    alloyId: '6063-T5',
    demoStockLength: 3000,
  },
  {
    id: 'metric-30',
    name: 'Metric 30 mm',
    unitFamily: 'metric',
    outerSize: 30,
    slotOpening: 8,
    slotLipThickness: 1.9,
    slotChamberWidth: 16.5,
    slotDepth: 9,
    slotEngagement: 5.5,
    centreBoreDiameter: 5, // M6 tap drill (common practice)
    endTapSize: 'M6',
    screwSize: 'M6',
    alloyId: '6063-T5',
    demoStockLength: 3000,
  },
  {
    id: 'metric-40',
    name: 'Metric 40 mm',
    unitFamily: 'metric',
    outerSize: 40,
    slotOpening: 8,
    slotLipThickness: 2.0,
    slotChamberWidth: 20,
    slotDepth: 12.2,
    slotEngagement: 6.5,
    centreBoreDiameter: 6.8, // M8 tap drill (common practice)
    endTapSize: 'M8',
    screwSize: 'M8',
    alloyId: '6063-T5',
    demoStockLength: 6000,
  },
  {
    id: 'metric-45',
    name: 'Metric 45 mm',
    unitFamily: 'metric',
    outerSize: 45,
    slotOpening: 10,
    slotLipThickness: 2.8,
    slotChamberWidth: 22.5,
    slotDepth: 13.5,
    slotEngagement: 7.5,
    centreBoreDiameter: 8.5, // M10 tap drill (common practice)
    endTapSize: 'M10',
    screwSize: 'M8',
    alloyId: '6063-T5',
    demoStockLength: 6000,
  },
];

export const profileSystems: ProfileSystem[] = figures.map((f) => {
  const p = SYSTEM_PREFIX[f.id];
  return {
    ...f,
    tNutIds: [`${p}-tnut-drop-in`, `${p}-tnut-slide-in`],
    defaultVariantId: squareVariantId(f.id),
    defaultConnectorId: `${p}-corner-bracket`,
    source: SOURCE,
  };
});

export function squareVariantId(systemId: SystemId): string {
  switch (systemId) {
    case 'inch-1.0':
      return 'in-1x1';
    case 'inch-1.5':
      return 'in-1.5x1.5';
    case 'metric-20':
      return 'm20-20x20';
    case 'metric-30':
      return 'm30-30x30';
    case 'metric-40':
      return 'm40-40x40';
    case 'metric-45':
      return 'm45-45x45';
  }
}
