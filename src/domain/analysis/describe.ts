/** Wording shared by the checks: part names, profile ends, numbers with units. */
import type { Joint, Panel, ProfileEnd } from '../design/schema';
import { dominantAxis } from '../geometry/vectors';
import type { ProfileInfo } from './context';

/** "12.5 mm", "8 mm": at most one decimal, no trailing zero. */
export function mm(value: number): string {
  return `${formatNumber(value)} mm`;
}

/** "1,234.5": thousands separated, at most `decimals` decimals (no locale lookup: it is slow at scale). */
export function formatNumber(value: number, decimals = 1): string {
  const f = 10 ** decimals;
  const rounded = Math.round(value * f) / f;
  if (rounded === 0) return '0';
  // Whole numbers below a thousand (most lengths and counts in messages) need no grouping or trimming.
  if (rounded < 1000 && rounded > -1000 && Number.isInteger(rounded)) return String(rounded);
  const negative = rounded < 0;
  const [whole, fraction] = Math.abs(rounded).toFixed(decimals).split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const trimmed = fraction ? fraction.replace(/0+$/, '') : '';
  return `${negative ? '-' : ''}${grouped}${trimmed ? `.${trimmed}` : ''}`;
}

/**
 * The name people read for a profile: its label ("Lower rail, back"), or else its length and the
 * way it runs. Never the internal id, which only the software reads.
 */
export function profileName(info: ProfileInfo | undefined, _id?: string): string {
  const label = info?.profile.label;
  if (label) return label;
  if (!info) return 'a profile that is not in the design';
  return `the ${formatNumber(info.profile.length)} mm profile ${RUN_WORDS[dominantAxis(info.profile.direction)]}`;
}

const RUN_WORDS: Record<0 | 1 | 2, string> = { 0: 'running left to right', 1: 'standing upright', 2: 'running front to back' };

const ROLE_WORDS: Record<Panel['role'], string> = { panel: 'panel', door: 'door', shelf: 'shelf' };

/** The name people read for a panel: its label, or else its size and role ("the 600 × 400 mm panel"). */
export function panelName(panel: Panel | undefined): string {
  if (!panel) return 'a panel that is not in the design';
  if (panel.label) return panel.label;
  return `the ${formatNumber(panel.rect.width)} × ${formatNumber(panel.rect.height)} mm ${ROLE_WORDS[panel.role] ?? 'panel'}`;
}

/** The name people read for a joint: its kind and the profiles it joins ("the corner bracket joining A and B"). */
export function jointName(ctx: { profileById: Map<string, ProfileInfo> }, joint: Joint): string {
  const names = joint.members.map((m) => profileName(ctx.profileById.get(m.profileId)));
  const kind = joint.kind.replace(/-/g, ' ');
  return `the ${kind} joining ${names.length > 2 ? `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}` : names.join(' and ')}`;
}

export { countOf } from '../words';

/** Lower and higher end along each axis. The design format's front is −Z, so the lower z end is the front. */
const END_WORDS: Record<0 | 1 | 2, [string, string]> = {
  0: ['left', 'right'],
  1: ['bottom', 'top'],
  2: ['front', 'back'],
};

/** "right", "top", "front"… : the end named by where it points in the model. */
export function endWord(info: ProfileInfo, end: ProfileEnd): string {
  const d = info.profile.direction;
  const axis = dominantAxis(d);
  const endIsHigher = d[axis] > 0 ? end === 'end' : end === 'start';
  return END_WORDS[axis][endIsHigher ? 1 : 0];
}

/** "The right end of profile P7" */
export function endPhrase(info: ProfileInfo, end: ProfileEnd): string {
  return `the ${endWord(info, end)} end of ${profileName(info, info.profile.id)}`;
}

export function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

export function findingId(check: string, reason: string, partIds: readonly string[]): string {
  return `${check}:${reason}:${partIds.join('+')}`;
}
