import { defaultCatalogue, getVariant } from '@/domain/catalogue';
import { formatForce, formatLength, formatMass, type LengthUnit } from '@/domain/units';
import type { BomUnit } from '@/domain/analysis/types';

// Display helpers for the outputs dock: lengths stay mm inside and only change form here.

const MM_PER_FOOT = 304.8;
const SQUARE_FEET_PER_SQUARE_METRE = 10.763910417;

const moneyFormat = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' });

export function formatMoney(amount: number): string {
  return moneyFormat.format(amount);
}

/** Lengths a shop reads: fractions to 1/32 in inch mode, whole or one-decimal mm otherwise. */
export function showLength(mm: number, units: LengthUnit): string {
  if (units === 'in') return formatLength(mm, 'in', { style: 'fraction', denominator: 32 });
  return formatLength(mm, 'mm', { decimals: Math.abs(mm - Math.round(mm)) < 0.05 ? 0 : 1 });
}

/** A tolerance such as "± 0.5 mm" or "± 1/64 in". */
export function showTolerance(mm: number, units: LengthUnit): string {
  if (units === 'in') return `± ${formatLength(mm, 'in', { style: 'decimal', decimals: 3 })}`;
  return `± ${formatLength(mm, 'mm', { decimals: 1 })}`;
}

export function showMass(kg: number, units: LengthUnit): string {
  return formatMass(kg, units);
}

export function showForce(newtons: number, units: LengthUnit): string {
  return formatForce(newtons, units);
}

/** BOM quantities: pieces as counts, profile metres as m (or ft), sheet as m² (or ft²). */
export function showQuantity(quantity: number, unit: BomUnit, units: LengthUnit): string {
  if (unit === 'pcs') return `${quantity} ${quantity === 1 ? 'pc' : 'pcs'}`;
  if (unit === 'm') {
    return units === 'in' ? `${((quantity * 1000) / MM_PER_FOOT).toFixed(2)} ft` : `${quantity.toFixed(3)} m`;
  }
  return units === 'in' ? `${(quantity * SQUARE_FEET_PER_SQUARE_METRE).toFixed(2)} ft²` : `${quantity.toFixed(3)} m²`;
}

/** The sale unit as shown: metres and square metres become feet and square feet in inch mode. */
export function showSaleUnit(unit: BomUnit, units: LengthUnit): string {
  if (units !== 'in' || unit === 'pcs') return unit;
  return unit === 'm' ? 'ft' : 'ft²';
}

/** Factor from a per-unit value (per m, per m²) to the displayed unit (per ft, per ft²). */
function perUnitFactor(unit: BomUnit, units: LengthUnit): number {
  if (units !== 'in' || unit === 'pcs') return 1;
  return unit === 'm' ? MM_PER_FOOT / 1000 : 1 / SQUARE_FEET_PER_SQUARE_METRE;
}

export function perUnitSuffix(unit: BomUnit, units: LengthUnit): string {
  if (unit === 'pcs') return ' ea';
  if (unit === 'm') return units === 'in' ? '/ft' : '/m';
  return units === 'in' ? '/ft²' : '/m²';
}

const GRAMS_PER_KILOGRAM = 1000;
const OUNCES_PER_KILOGRAM = 35.27396195;

/** Per-unit masses: small hardware reads better in g (or oz) than as 0.01 kg. */
export function showUnitMass(kgPerUnit: number, unit: BomUnit, units: LengthUnit): string {
  const kg = kgPerUnit * perUnitFactor(unit, units);
  const suffix = perUnitSuffix(unit, units);
  if (units === 'mm' && kg < 1) return `${Math.round(kg * GRAMS_PER_KILOGRAM)} g${suffix}`;
  if (units === 'in' && kg * OUNCES_PER_KILOGRAM < 16) return `${(kg * OUNCES_PER_KILOGRAM).toFixed(kg * OUNCES_PER_KILOGRAM < 10 ? 2 : 1)} oz${suffix}`;
  return `${showMass(kg, units)}${suffix}`;
}

export function showUnitPrice(pricePerUnit: number, unit: BomUnit, units: LengthUnit): string {
  return `${formatMoney(pricePerUnit * perUnitFactor(unit, units))}${perUnitSuffix(unit, units)}`;
}

/** "Two-level printer enclosure" → "two-level-printer-enclosure-bom.csv". */
export function csvFileName(designName: string, kind: string): string {
  const slug = designName
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return `${slug || 'design'}-${kind}.csv`;
}

export const NUMBER_CELL = 'text-right tabular-nums whitespace-nowrap';

/** Small lengths (deflections) as decimals: a fraction to 1/32 in would round them to nothing. */
export function showSmallLength(mm: number, units: LengthUnit): string {
  return units === 'in' ? formatLength(mm, 'in', { style: 'decimal', decimals: 3 }) : formatLength(mm, 'mm', { decimals: 2 });
}

/** Stress in MPa (or psi for inch users). */
export function showStress(mpa: number, units: LengthUnit): string {
  if (units === 'in') return `${Math.round(mpa * 145.0377377).toLocaleString('en-US')} psi`;
  return `${mpa < 10 ? mpa.toFixed(2) : mpa.toFixed(1)} MPa`;
}

/** The name people read for a profile variant ("40 x 40 mm", "1.5 x 3 in"), never its id. */
export function variantName(variantId: string): string {
  const variant = getVariant(defaultCatalogue, variantId);
  if (!variant) return variantId;
  return variant.name.replace(/ profile$/, '').replace(/^Metric \d+ mm profile /, '');
}
