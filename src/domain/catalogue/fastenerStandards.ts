/**
 * Hex key and thread data for the cap screws Slotwise uses. Hex keys: ASME B18.3 (inch socket,
 * button and flat countersunk heads), ISO 4762 (metric socket head), ISO 7380-1 (metric button
 * head), ISO 10642 (metric flat countersunk head). Threads: ASME B1.1 unified series and ISO 261/262
 * metric coarse pitches. Lengths in mm unless a label says otherwise.
 */
import { MM_PER_INCH } from '../units';

export type ScrewHead = 'socket' | 'button' | 'flat';
export type ScrewSize = '#8' | '#10' | '1/4' | '5/16' | '3/8' | '1/2' | 'M3' | 'M4' | 'M5' | 'M6' | 'M8' | 'M10' | 'M12';

export const INCH_SCREW_SIZES = ['#8', '#10', '1/4', '5/16', '3/8', '1/2'] as const satisfies readonly ScrewSize[];
export const METRIC_SCREW_SIZES = ['M3', 'M4', 'M5', 'M6', 'M8', 'M10', 'M12'] as const satisfies readonly ScrewSize[];
export const SCREW_SIZES: readonly ScrewSize[] = [...INCH_SCREW_SIZES, ...METRIC_SCREW_SIZES];

/** True when the size is an inch (unified) size. */
export function isInchScrewSize(size: ScrewSize): boolean {
  return !size.startsWith('M');
}

/** Hex key across flats: inch keys as fractions of an inch, metric keys in mm. */
type KeyTable = Record<ScrewHead, Record<ScrewSize, string>>;

/** Nominal hex key per head and size, as printed in the standards (inch keys in inches, metric in mm). */
export const HEX_KEY_TABLE: KeyTable = {
  socket: {
    // ASME B18.3, socket head cap screws
    '#8': '9/64', '#10': '5/32', '1/4': '3/16', '5/16': '1/4', '3/8': '5/16', '1/2': '3/8',
    // ISO 4762
    M3: '2.5', M4: '3', M5: '4', M6: '5', M8: '6', M10: '8', M12: '10',
  },
  button: {
    // ASME B18.3, button head cap screws
    '#8': '3/32', '#10': '1/8', '1/4': '5/32', '5/16': '3/16', '3/8': '7/32', '1/2': '5/16',
    // ISO 7380-1
    M3: '2', M4: '2.5', M5: '3', M6: '4', M8: '5', M10: '6', M12: '8',
  },
  flat: {
    // ASME B18.3, flat countersunk head cap screws
    '#8': '3/32', '#10': '1/8', '1/4': '5/32', '5/16': '3/16', '3/8': '7/32', '1/2': '5/16',
    // ISO 10642
    M3: '2', M4: '2.5', M5: '3', M6: '4', M8: '5', M10: '6', M12: '8',
  },
};

const KEY_STANDARDS: Record<ScrewHead, { inch: string; metric: string }> = {
  socket: { inch: 'ASME B18.3', metric: 'ISO 4762' },
  button: { inch: 'ASME B18.3', metric: 'ISO 7380-1' },
  flat: { inch: 'ASME B18.3', metric: 'ISO 10642' },
};

function fractionValue(text: string): number {
  const [numerator, denominator] = text.split('/').map(Number);
  return denominator ? numerator / denominator : numerator;
}

/** The hex key a screw needs: label ('5/32 in' or '4 mm'), size across flats in mm, and the standard it comes from. */
export function hexKeyFor(head: ScrewHead, size: ScrewSize): { label: string; mm: number; standard: string } {
  const key = HEX_KEY_TABLE[head]?.[size];
  if (key === undefined) throw new Error(`No hex key known for a ${head} head ${size} screw.`);
  if (isInchScrewSize(size)) {
    return { label: `${key} in`, mm: fractionValue(key) * MM_PER_INCH, standard: KEY_STANDARDS[head].inch };
  }
  return { label: `${key} mm`, mm: Number(key), standard: KEY_STANDARDS[head].metric };
}

interface ThreadEntry {
  designation: string;
  /** threads per inch for unified threads */
  threadsPerInch?: number;
  /** mm, for metric threads */
  pitch?: number;
  source: string;
}

/** Basic major diameter in inches of a unified thread: numbered sizes are 0.060 + 0.013·N in (ASME B1.1). */
const INCH_NOMINAL_DIAMETER: Record<string, number> = {
  '#8': 0.164,
  '#10': 0.19,
  '1/4': 0.25,
  '5/16': 0.3125,
  '3/8': 0.375,
  '1/2': 0.5,
};

const METRIC_NOMINAL_DIAMETER: Record<string, number> = { M3: 3, M4: 4, M5: 5, M6: 6, M8: 8, M10: 10, M12: 12 };

const ASME = 'ASME B1.1 unified series (verified)';
const ISO_COARSE = 'ISO 261/262 coarse pitch (verified)';
const MEMORY = 'recalled from memory, not checked against the standard';

/** Thread series per size; fine entries not in the check-values list are marked as recalled from memory. */
export const THREAD_TABLE: Record<ScrewSize, { coarse: ThreadEntry; fine: ThreadEntry }> = {
  '#8': { coarse: { designation: '#8-32', threadsPerInch: 32, source: ASME }, fine: { designation: '#8-36', threadsPerInch: 36, source: `ASME B1.1 UNF, ${MEMORY}` } },
  '#10': { coarse: { designation: '#10-24', threadsPerInch: 24, source: ASME }, fine: { designation: '#10-32', threadsPerInch: 32, source: ASME } },
  '1/4': { coarse: { designation: '1/4-20', threadsPerInch: 20, source: ASME }, fine: { designation: '1/4-28', threadsPerInch: 28, source: ASME } },
  '5/16': { coarse: { designation: '5/16-18', threadsPerInch: 18, source: ASME }, fine: { designation: '5/16-24', threadsPerInch: 24, source: ASME } },
  '3/8': { coarse: { designation: '3/8-16', threadsPerInch: 16, source: ASME }, fine: { designation: '3/8-24', threadsPerInch: 24, source: `ASME B1.1 UNF, ${MEMORY}` } },
  '1/2': { coarse: { designation: '1/2-13', threadsPerInch: 13, source: ASME }, fine: { designation: '1/2-20', threadsPerInch: 20, source: `ASME B1.1 UNF, ${MEMORY}` } },
  M3: { coarse: { designation: 'M3 x 0.5', pitch: 0.5, source: ISO_COARSE }, fine: { designation: 'M3 x 0.35', pitch: 0.35, source: `ISO 261 fine, ${MEMORY}` } },
  M4: { coarse: { designation: 'M4 x 0.7', pitch: 0.7, source: ISO_COARSE }, fine: { designation: 'M4 x 0.5', pitch: 0.5, source: `ISO 261 fine, ${MEMORY}` } },
  M5: { coarse: { designation: 'M5 x 0.8', pitch: 0.8, source: ISO_COARSE }, fine: { designation: 'M5 x 0.5', pitch: 0.5, source: `ISO 261 fine, ${MEMORY}` } },
  M6: { coarse: { designation: 'M6 x 1', pitch: 1.0, source: ISO_COARSE }, fine: { designation: 'M6 x 0.75', pitch: 0.75, source: `ISO 261 fine, ${MEMORY}` } },
  M8: { coarse: { designation: 'M8 x 1.25', pitch: 1.25, source: ISO_COARSE }, fine: { designation: 'M8 x 1', pitch: 1.0, source: `ISO 261 fine, ${MEMORY}` } },
  M10: { coarse: { designation: 'M10 x 1.5', pitch: 1.5, source: ISO_COARSE }, fine: { designation: 'M10 x 1.25', pitch: 1.25, source: `ISO 261 fine, ${MEMORY}` } },
  M12: { coarse: { designation: 'M12 x 1.75', pitch: 1.75, source: ISO_COARSE }, fine: { designation: 'M12 x 1.25', pitch: 1.25, source: `ISO 261 fine, ${MEMORY}` } },
};

/** Thread of a screw size: designation ('1/4-20', 'M8 x 1.25'), pitch in mm and nominal (major) diameter in mm. Coarse by default. */
export function threadFor(size: ScrewSize, series: 'coarse' | 'fine' = 'coarse'): { designation: string; pitchMm: number; nominalDiameterMm: number; source: string } {
  const entry = THREAD_TABLE[size]?.[series];
  if (!entry) throw new Error(`No ${series} thread known for size ${size}.`);
  if (entry.threadsPerInch !== undefined) {
    return {
      designation: entry.designation,
      pitchMm: MM_PER_INCH / entry.threadsPerInch,
      nominalDiameterMm: INCH_NOMINAL_DIAMETER[size] * MM_PER_INCH,
      source: entry.source,
    };
  }
  return { designation: entry.designation, pitchMm: entry.pitch!, nominalDiameterMm: METRIC_NOMINAL_DIAMETER[size], source: entry.source };
}

/** Minimum thread engagement in mm into aluminium: 2 × nominal diameter (common engineering guidance, partly sourced). */
export function minimumEngagementInAluminium(size: ScrewSize): number {
  return 2 * threadFor(size).nominalDiameterMm;
}
