/**
 * Profile variants: a square one per system plus the double-width ones (1 x 2 in, 1.5 x 3 in,
 * 40 x 80 mm). Section properties are computed from our own drawn polygon; a supplier's published
 * figures can replace them through `overrides`.
 */
import { polygonSectionProperties, type SectionProperties } from '../structure/sectionProperties';
import { drawCrossSection } from './crossSection';
import { squareVariantId, systemPartCode } from './systems';
import type { ProfileSystem, ProfileVariant, SectionOverrides, SystemId } from './types';

interface VariantSpec {
  id: string;
  systemId: SystemId;
  name: string;
  cells: 1 | 2;
  sizeCode: string;
}

const variantSpecs: VariantSpec[] = [
  { id: squareVariantId('inch-1.0'), systemId: 'inch-1.0', name: '1 in square', cells: 1, sizeCode: '1X1' },
  { id: 'in-1x2', systemId: 'inch-1.0', name: '1 x 2 in', cells: 2, sizeCode: '1X2' },
  { id: squareVariantId('inch-1.5'), systemId: 'inch-1.5', name: '1.5 in square', cells: 1, sizeCode: '15X15' },
  { id: 'in-1.5x3', systemId: 'inch-1.5', name: '1.5 x 3 in', cells: 2, sizeCode: '15X30' },
  { id: squareVariantId('metric-20'), systemId: 'metric-20', name: '20 x 20 mm', cells: 1, sizeCode: '20X20' },
  { id: squareVariantId('metric-30'), systemId: 'metric-30', name: '30 x 30 mm', cells: 1, sizeCode: '30X30' },
  { id: squareVariantId('metric-40'), systemId: 'metric-40', name: '40 x 40 mm', cells: 1, sizeCode: '40X40' },
  { id: 'm40-40x80', systemId: 'metric-40', name: '40 x 80 mm', cells: 2, sizeCode: '40X80' },
  { id: squareVariantId('metric-45'), systemId: 'metric-45', name: '45 x 45 mm', cells: 1, sizeCode: '45X45' },
];

/** Replaces computed section figures with published ones; mass follows the area unless given. */
export function applySectionOverrides(
  variant: ProfileVariant,
  overrides: SectionOverrides | undefined,
  densityKgPerM3: number,
): ProfileVariant {
  const computed = variant.computedSectionProperties;
  if (!overrides) {
    return {
      ...variant,
      overrides: undefined,
      sectionProperties: computed,
      massPerMetre: massPerMetre(computed.area, densityKgPerM3),
      propertiesSource: 'computed',
    };
  }
  const props: SectionProperties = { ...computed };
  if (overrides.area !== undefined) props.area = overrides.area;
  if (overrides.ix !== undefined) props.ix = overrides.ix;
  if (overrides.iy !== undefined) props.iy = overrides.iy;
  props.sx = overrides.sx ?? (overrides.ix !== undefined ? overrides.ix / (variant.height / 2) : computed.sx);
  props.sy = overrides.sy ?? (overrides.iy !== undefined ? overrides.iy / (variant.width / 2) : computed.sy);
  props.rx = Math.sqrt(props.ix / props.area);
  props.ry = Math.sqrt(props.iy / props.area);
  return {
    ...variant,
    overrides,
    sectionProperties: props,
    massPerMetre: overrides.massPerMetre ?? massPerMetre(props.area, densityKgPerM3),
    propertiesSource: overrides.source,
  };
}

/** kg/m from an area in mm² and a density in kg/m³. */
export function massPerMetre(areaMm2: number, densityKgPerM3: number): number {
  return areaMm2 * 1e-6 * densityKgPerM3;
}

export function buildVariants(systems: ProfileSystem[], densityFor: (alloyId: string) => number): ProfileVariant[] {
  return variantSpecs.map((spec) => {
    const system = systems.find((s) => s.id === spec.systemId);
    if (!system) throw new Error(`Variant ${spec.id} names an unknown system ${spec.systemId}`);
    const crossSection = drawCrossSection(
      {
        cellSize: system.outerSize,
        slotOpening: system.slotOpening,
        lipThickness: system.slotLipThickness,
        chamberWidth: system.slotChamberWidth,
        slotDepth: system.slotDepth,
        centreBoreDiameter: system.centreBoreDiameter,
      },
      spec.cells,
    );
    const computed = polygonSectionProperties(crossSection.outline, crossSection.holes);
    const base: ProfileVariant = {
      id: spec.id,
      partCode: `SW-${systemPartCode(spec.systemId)}-EXT-${spec.sizeCode}`,
      systemId: spec.systemId,
      // Inch systems are named by nominal size already: "1.5 x 3 in profile", not "1.5 in square profile 1.5 x 3 in".
      name: system.unitFamily === 'inch' ? `${spec.name} profile` : `${system.name} profile ${spec.name}`,
      width: system.outerSize,
      height: system.outerSize * spec.cells,
      cells: spec.cells,
      crossSection,
      computedSectionProperties: computed,
      sectionProperties: computed,
      massPerMetre: 0,
      propertiesSource: 'computed',
    };
    return applySectionOverrides(base, undefined, densityFor(system.alloyId));
  });
}
