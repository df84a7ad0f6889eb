/**
 * Lengths are millimetres inside Slotwise; inches, feet and fractions exist only where a person
 * reads or types. 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
 */

/** Millimetres in one inch, exact by definition. */
export const MM_PER_INCH = 25.4;
/** Inches in one foot. */
export const INCHES_PER_FOOT = 12;
/** Newtons in one pound-force: 0.45359237 kg × 9.80665 m/s², both exact by definition. */
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;
/** Kilograms in one pound (avoirdupois), exact by definition. */
export const KILOGRAMS_PER_POUND = 0.45359237;

/** The length units a person reads and types in; the one list (contracts and the design schema use it). */
export const LENGTH_UNITS = ['mm', 'in'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

export type ParsedLength = { ok: true; mm: number } | { ok: false; error: string };

/** Converts millimetres to inches. */
export function mmToInches(mm: number): number {
  return mm / MM_PER_INCH;
}

/** Converts inches to millimetres. */
export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

/** Converts newtons to pounds-force. */
export function newtonsToPoundsForce(n: number): number {
  return n / NEWTONS_PER_POUND_FORCE;
}

/** Converts pounds-force to newtons. */
export function poundsForceToNewtons(lbf: number): number {
  return lbf * NEWTONS_PER_POUND_FORCE;
}

/** Converts kilograms to pounds (mass). */
export function kilogramsToPounds(kg: number): number {
  return kg / KILOGRAMS_PER_POUND;
}

// ---------------------------------------------------------------------------------------------
// Parsing

const UNIT_WORDS: Record<string, 'mm' | 'cm' | 'm' | 'in' | 'ft'> = {
  mm: 'mm',
  millimetre: 'mm',
  millimetres: 'mm',
  millimeter: 'mm',
  millimeters: 'mm',
  cm: 'cm',
  m: 'm',
  metre: 'm',
  metres: 'm',
  meter: 'm',
  meters: 'm',
  in: 'in',
  'in.': 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  ft: 'ft',
  'ft.': 'ft',
  foot: 'ft',
  feet: 'ft',
  "'": 'ft',
};

const MM_PER: Record<'mm' | 'cm' | 'm' | 'in' | 'ft', number> = {
  mm: 1,
  cm: 10,
  m: 1000,
  in: MM_PER_INCH,
  ft: MM_PER_INCH * INCHES_PER_FOOT,
};

const VULGAR_FRACTIONS: Record<string, string> = {
  '¼': '1/4',
  '½': '1/2',
  '¾': '3/4',
  '⅛': '1/8',
  '⅜': '3/8',
  '⅝': '5/8',
  '⅞': '7/8',
};

// One magnitude: "23-7/16", "23 7/16", "7/8", "23.4375", ".5", "23." followed by an optional unit.
const TERM =
  /\s*(?:(\d+)(?:\s+|-)(\d+)\s*\/\s*(\d+)|(\d+)\s*\/\s*(\d+)|(\d+(?:\.\d*)?|\.\d+))\s*(millimetres|millimeters|millimetre|millimeter|metres|meters|metre|meter|inches|inch|in\.|in|feet|foot|ft\.|ft|mm|cm|m|"|')?/iy;

interface Term {
  value: number;
  unit?: 'mm' | 'cm' | 'm' | 'in' | 'ft';
  zeroDenominator?: string;
}

function readTerm(text: string, at: number): { term: Term; next: number } | null {
  TERM.lastIndex = at;
  const match = TERM.exec(text);
  if (!match || match[0].trim() === '') return null;
  const [, whole, mixedNumerator, mixedDenominator, numerator, denominator, decimal, unitWord] = match;
  const unit = unitWord ? UNIT_WORDS[unitWord.toLowerCase()] : undefined;
  let value: number;
  if (whole !== undefined) {
    const den = Number(mixedDenominator);
    if (den === 0) return { term: { value: NaN, zeroDenominator: `${mixedNumerator}/${mixedDenominator}` }, next: TERM.lastIndex };
    value = Number(whole) + Number(mixedNumerator) / den;
  } else if (numerator !== undefined) {
    const den = Number(denominator);
    if (den === 0) return { term: { value: NaN, zeroDenominator: `${numerator}/${denominator}` }, next: TERM.lastIndex };
    value = Number(numerator) / den;
  } else {
    value = Number(decimal);
  }
  return { term: { value, unit }, next: TERM.lastIndex };
}

function normalise(text: string): string {
  let out = text
    .replace(/[″“”]/g, '"')
    .replace(/[′‘’]/g, "'")
    .replace(/''/g, '"')
    .replace(/⁄/g, '/')
    .replace(/[−–]/g, '-');
  for (const [glyph, fraction] of Object.entries(VULGAR_FRACTIONS)) {
    out = out.replace(new RegExp(`(\\d)\\s*${glyph}`, 'g'), `$1 ${fraction}`).replace(new RegExp(glyph, 'g'), fraction);
  }
  return out.trim();
}

/**
 * Reads a length a person typed and returns it in millimetres. Accepts "23-7/16 in", "23 7/16\"",
 * "7/8\"", "1' 2-1/2\"", "600", "600 mm", "60 cm", "0.6 m"; a bare number is in `defaultUnit`.
 * The sign is kept (callers decide whether a negative length is allowed).
 */
export function parseLength(text: string, defaultUnit: LengthUnit): ParsedLength {
  const shown = text.trim();
  if (shown === '') return { ok: false, error: 'Enter a length, for example 23-7/16 in or 595 mm.' };
  const cannotRead: ParsedLength = {
    ok: false,
    error: `Could not read “${shown}” as a length. Try 23-7/16 in or 595 mm.`,
  };
  let rest = normalise(shown);
  let sign = 1;
  if (rest.startsWith('-')) {
    sign = -1;
    rest = rest.slice(1);
  } else if (rest.startsWith('+')) {
    rest = rest.slice(1);
  }

  const first = readTerm(rest, 0);
  if (!first) return cannotRead;
  if (first.term.zeroDenominator) {
    return { ok: false, error: `The fraction ${first.term.zeroDenominator} in “${shown}” divides by zero. Try 23-7/16 in or 595 mm.` };
  }
  let mm: number;
  let position = first.next;
  if (first.term.unit === 'ft') {
    // Feet may be followed by inches: 1' 2-1/2" (a bare second number is inches).
    mm = first.term.value * MM_PER.ft;
    if (position < rest.length) {
      const second = readTerm(rest, position);
      if (!second) return cannotRead;
      if (second.term.zeroDenominator) {
        return { ok: false, error: `The fraction ${second.term.zeroDenominator} in “${shown}” divides by zero. Try 23-7/16 in or 595 mm.` };
      }
      if (second.term.unit !== undefined && second.term.unit !== 'in') return cannotRead;
      mm += second.term.value * MM_PER.in;
      position = second.next;
    }
  } else {
    mm = first.term.value * MM_PER[first.term.unit ?? defaultUnit];
  }
  if (rest.slice(position).trim() !== '') return cannotRead;
  if (!Number.isFinite(mm)) return { ok: false, error: `“${shown}” is too large to be a length.` };
  return { ok: true, mm: sign * mm === 0 ? 0 : sign * mm };
}

// ---------------------------------------------------------------------------------------------
// Formatting

function trimDecimals(value: number, decimals: number): string {
  const fixed = value.toFixed(decimals);
  const trimmed = fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
  return trimmed === '-0' ? '0' : trimmed;
}

function greatestCommonDivisor(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

/** Formats an inch value as a whole number and a fraction reduced to lowest terms, e.g. 23-7/16. */
export function formatInchFraction(inches: number, denominator: 16 | 32 = 32): string {
  const steps = Math.round(Math.abs(inches) * denominator);
  const sign = inches < 0 && steps !== 0 ? '-' : '';
  const whole = Math.floor(steps / denominator);
  let numerator = steps % denominator;
  let den: number = denominator;
  if (numerator === 0) return `${sign}${whole}`;
  const divisor = greatestCommonDivisor(numerator, den);
  numerator /= divisor;
  den /= divisor;
  return whole === 0 ? `${sign}${numerator}/${den}` : `${sign}${whole}-${numerator}/${den}`;
}

/**
 * Formats a length given in millimetres for a person: inches as reduced fractions to the nearest
 * 1/32 in by default (`23-7/16 in`), or millimetres with up to 1 decimal (`595.3 mm`).
 */
export function formatLength(
  mm: number,
  unit: LengthUnit,
  opts: { denominator?: 16 | 32; decimals?: number; style?: 'fraction' | 'decimal'; withUnit?: boolean } = {},
): string {
  const withUnit = opts.withUnit ?? true;
  if (unit === 'mm') {
    const text = trimDecimals(mm, opts.decimals ?? 1);
    return withUnit ? `${text} mm` : text;
  }
  const inches = mmToInches(mm);
  const text =
    (opts.style ?? 'fraction') === 'decimal'
      ? trimDecimals(inches, opts.decimals ?? 3)
      : formatInchFraction(inches, opts.denominator ?? 32);
  return withUnit ? `${text} in` : text;
}

function formatMagnitude(value: number): string {
  const size = Math.abs(value);
  if (size < 10) return trimDecimals(value, 2);
  if (size < 100) return trimDecimals(value, 1);
  return trimDecimals(value, 0);
}

/** Formats a mass given in kilograms: kg for 'mm' users, lb for 'in' users (e.g. "12.4 kg", "27.3 lb"). */
export function formatMass(kg: number, unit: LengthUnit): string {
  return unit === 'mm' ? `${formatMagnitude(kg)} kg` : `${formatMagnitude(kilogramsToPounds(kg))} lb`;
}

/** Formats a force given in newtons: N or kN for 'mm' users, lbf for 'in' users (e.g. "850 N", "16.9 kN", "190 lbf"). */
export function formatForce(n: number, unit: LengthUnit): string {
  if (unit === 'in') return `${formatMagnitude(newtonsToPoundsForce(n))} lbf`;
  if (Math.abs(n) >= 10_000) return `${formatMagnitude(n / 1000)} kN`;
  return `${formatMagnitude(n)} N`;
}
