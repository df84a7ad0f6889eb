/**
 * Cap screws in each system's sizes and common lengths, three heads each. Hex keys come from
 * the screw standards through hexKeyFor. Masses are estimates (steel, shank plus head);
 * prices are demo prices, invented.
 */
import { hexKeyFor, threadFor, type ScrewHead, type ScrewSize } from './fastenerStandards';
import type { Fastener } from './types';

const INCH = 25.4;

/** Common lengths per size (common practice, no source); inch sizes in inches. */
export const FASTENER_LENGTHS: Partial<Record<ScrewSize, number[]>> = {
  '1/4': [0.5, 0.625, 0.75, 1, 1.25, 1.5].map((l) => l * INCH),
  '5/16': [0.625, 0.75, 1, 1.25, 1.5, 2.25].map((l) => l * INCH),
  M5: [8, 10, 12, 16, 20, 25, 30],
  M6: [10, 12, 16, 20, 25, 30, 45],
  M8: [12, 16, 20, 25, 30, 35, 40, 60],
  M10: [16, 20, 25, 30, 35, 65],
};

const HEADS: ScrewHead[] = ['socket', 'button', 'flat'];
const HEAD_NAMES: Record<ScrewHead, string> = {
  socket: 'Socket head cap screw',
  button: 'Button head cap screw',
  flat: 'Flat head countersunk screw',
};
const HEAD_CODES: Record<ScrewHead, string> = { socket: 'SHC', button: 'BHC', flat: 'FHC' };
/** Head mass as a share of a cylinder 1.5 d across and d high (our estimate). */
const HEAD_MASS_SHARE: Record<ScrewHead, number> = { socket: 1, button: 0.6, flat: 0.45 };
const STEEL_DENSITY = 7850; // kg/m³, common value

export function sizeSlug(size: ScrewSize): string {
  return size.replace('/', '_').replace('#', 'no');
}

function isInch(size: ScrewSize): boolean {
  return !size.startsWith('M');
}

export function lengthLabel(size: ScrewSize, lengthMm: number): string {
  if (!isInch(size)) return `${lengthMm}`;
  const inches = lengthMm / INCH;
  return `${Math.round(inches * 1000) / 1000}in`;
}

export function fastenerId(head: ScrewHead, size: ScrewSize, lengthMm: number): string {
  return `fst-${head}-${sizeSlug(size)}-${lengthLabel(size, lengthMm)}`;
}

/** One fastener record (id, code, mass, demo price, hex key by standard). */
export function makeFastener(head: ScrewHead, size: ScrewSize, length: number): Fastener {
  const thread = threadFor(size);
  const d = thread.nominalDiameterMm;
  const volume = (Math.PI / 4) * d * d * length + HEAD_MASS_SHARE[head] * (Math.PI / 4) * (1.5 * d) ** 2 * d;
  const mass = volume * 1e-9 * STEEL_DENSITY;
  const lengthText = isInch(size) ? `${Math.round((length / INCH) * 1000) / 1000} in` : `${length} mm`;
  return {
    id: fastenerId(head, size, length),
    partCode: `SW-FST-${HEAD_CODES[head]}-${sizeSlug(size).toUpperCase()}-${lengthLabel(size, length).toUpperCase()}`,
    head,
    size,
    length: Math.round(length * 1000) / 1000,
    thread: thread.designation,
    name: `${HEAD_NAMES[head]} ${thread.designation} x ${lengthText}`,
    hexKey: hexKeyFor(head, size),
    unitMass: Math.round(mass * 10000) / 10000,
    price: Math.round((0.06 + 0.0009 * d * length) * 100) / 100,
  };
}

export function buildFasteners(): Fastener[] {
  const out: Fastener[] = [];
  for (const [size, lengths] of Object.entries(FASTENER_LENGTHS) as [ScrewSize, number[]][]) {
    for (const head of HEADS) for (const length of lengths) out.push(makeFastener(head, size, length));
  }
  return out;
}
