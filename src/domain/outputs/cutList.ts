/**
 * Cut list: every profile piece with its length and tolerance, what happens at each end (tap,
 * cap, foot, caster, plain) and its machining with positions from a named end; identical pieces
 * grouped with a quantity.
 */
import type { CutListGroup, CutListItem, CutMachiningOperation, EndTreatment } from '../analysis/types';
import { threadFor, type ScrewSize } from '../catalogue/fastenerStandards';
import { accessoriesAt, type AnalysisContext, type ProfileInfo } from '../analysis/context';
import { endWord, formatNumber } from '../analysis/describe';
import type { ProfileEnd } from '../design/schema';

const MACHINING_NAMES: Record<CutMachiningOperation['kind'], string> = {
  'access-counterbore': 'Access counterbore',
  'access-hole': 'Access hole',
  'end-tap': 'End tap',
  drill: 'Drill',
};

export function cutList(ctx: AnalysisContext): { items: CutListItem[]; groups: CutListGroup[] } {
  const tolerance = ctx.design.settings.cutTolerance;
  const items = new Array<CutListItem>(ctx.profiles.length);
  const groups = new Map<string, CutListGroup>();
  // Frames repeat a few kinds of piece: end treatments (read-only, shared by the items and groups
  // that have them) and the group key's head are made once per kind, not once per profile.
  // Caches are nested maps keyed by the parts themselves, so no key string is built per profile.
  const treatments: Nested<EndTreatment> = new Map();
  const keyHeads: Nested<string> = new Map();
  const keyParts: Nested<string> = new Map();
  const threads = new Map<ProfileInfo['system'], string | undefined>();
  // The ends of a piece depend on its system's tap thread, the word for its start end (which
  // fixes the word for the other) and the two end kinds: one table of shared, read-only `ends`
  // per system and start word, indexed by the two kinds, so a piece costs one map look-up here.
  const endsTables = new Map<ProfileInfo['system'], Map<string, (EndsEntry | undefined)[]>>();
  const otherEndWord = new Map<string, string>();
  const tapDescriptions = new Map<string, Map<string, string>>();
  let lastSystem: ProfileInfo['system'] | null = null;
  let thread: string | undefined;
  let tables: Map<string, (EndsEntry | undefined)[]> = new Map();
  const profiles = ctx.profiles;
  for (let p = 0; p < profiles.length; p++) {
    const info = profiles[p];
    if (info.system !== lastSystem || lastSystem === null) {
      thread = threads.get(info.system);
      if (thread === undefined && !threads.has(info.system)) threads.set(info.system, (thread = tapThread(info)));
      let known = endsTables.get(info.system);
      if (!known) endsTables.set(info.system, (known = new Map()));
      tables = known;
      lastSystem = info.system;
    }
    const startWord = endWord(info, 'start');
    let table = tables.get(startWord);
    if (!table) tables.set(startWord, (table = []));
    const slot = endKindIndex(info, 'start', info.startAccessories) * END_KINDS.length + endKindIndex(info, 'end', info.endAccessories);
    let entry = table[slot];
    if (!entry) {
      // Made as before, from the shared end treatments, on the first piece of each kind.
      entry = { ends: { start: endTreatment(info, 'start', thread, treatments), end: endTreatment(info, 'end', thread, treatments) }, heads: new Map() };
      table[slot] = entry;
    }
    const ends = entry.ends;
    const machining = info.profile.machining.length === 0 ? NO_MACHINING : machiningOperations(info, thread, startWord, otherEndWord, tapDescriptions);
    const { variantId, length } = info.profile;
    // The group key's head by variant and length under the piece's ends (two look-ups, not four).
    let byLength = entry.heads.get(variantId);
    if (!byLength) entry.heads.set(variantId, (byLength = new Map()));
    let head = byLength.get(length);
    if (head === undefined) byLength.set(length, (head = cachedHead(keyHeads, variantId, length, ends.start.kind, ends.end.kind)));
    let groupKey = head;
    for (const m of machining) groupKey = cachedKeyPart(keyParts, groupKey, m);
    items[p] = {
      id: info.profile.id,
      label: info.profile.label ?? info.profile.id,
      variantId,
      length,
      tolerance,
      ends,
      machining,
      groupKey,
    };
    const group = groups.get(groupKey);
    if (group) {
      group.quantity += 1;
      group.profileIds.push(info.profile.id);
    } else {
      groups.set(groupKey, {
        groupKey,
        variantId,
        length,
        tolerance,
        quantity: 1,
        profileIds: [info.profile.id],
        ends,
        machining,
      });
    }
  }
  const sortedGroups = [...groups.values()].sort((a, b) => (a.variantId === b.variantId ? b.length - a.length : a.variantId < b.variantId ? -1 : 1));
  return { items, groups: sortedGroups };
}

type Ends = CutListItem['ends'];

/** Shared (never changed) machining list of the pieces without machining, most of a frame's. */
const NO_MACHINING: CutMachiningOperation[] = [];

/** Shared ends of one kind of piece, and its group keys' heads by variant and length. */
interface EndsEntry {
  ends: Ends;
  heads: Map<string, Map<number, string>>;
}

/** The end kinds, numbered as `endKindIndex` gives them. */
const END_KINDS: readonly EndTreatment['kind'][] = ['plain', 'tap', 'cap', 'foot', 'caster'];

/**
 * The piece's machining, from its start end. An end tap's description (the same for every piece
 * with the same thread and end word: the legs of a frame) is made once; `startWord` is the word
 * for the piece's start end and `otherEndWord` remembers the word for the other end.
 */
function machiningOperations(
  info: ProfileInfo,
  thread: string | undefined,
  startWord: string,
  otherEndWord: Map<string, string>,
  tapDescriptions: Map<string, Map<string, string>>,
): CutMachiningOperation[] {
  const list = info.profile.machining;
  const out = new Array<CutMachiningOperation>(list.length);
  for (let k = 0; k < list.length; k++) {
    const m = list[k];
    let word = startWord;
    if (m.fromEnd !== 'start') {
      const known = otherEndWord.get(startWord);
      if (known === undefined) otherEndWord.set(startWord, (word = endWord(info, m.fromEnd)));
      else word = known;
    }
    let description: string;
    if (m.kind === 'end-tap') {
      let byWord = tapDescriptions.get(thread ?? '');
      if (!byWord) tapDescriptions.set(thread ?? '', (byWord = new Map()));
      const made = byWord.get(word);
      if (made === undefined) byWord.set(word, (description = `${MACHINING_NAMES[m.kind]}${thread ? ` ${thread}` : ''} in the ${word} end`));
      else description = made;
    } else {
      description = `${MACHINING_NAMES[m.kind]}${m.diameter ? ` Ø ${formatNumber(m.diameter)} mm` : ''} on face ${m.face}, ${formatNumber(m.offset)} mm from the ${word} end`;
    }
    out[k] = { id: m.id, kind: m.kind, fromEnd: m.fromEnd, offset: m.offset, face: m.face, diameter: m.diameter ?? null, description };
  }
  return out.length > 1 ? out.sort((a, b) => (a.fromEnd === b.fromEnd ? a.offset - b.offset : a.fromEnd === 'start' ? -1 : 1)) : out;
}

function tapThread(info: ProfileInfo): string | undefined {
  const size = info.system?.endTapSize;
  return size ? threadFor(size as ScrewSize).designation : undefined;
}

/** Values under a path of keys (strings and numbers), for caches without key strings. */
type Nested<T> = Map<string | number, Nested<T> | T>;

/** The group key's head for a kind of piece, made once per kind (no key path array or closure per profile). */
function cachedHead(root: Nested<string>, variantId: string, length: number, startKind: string, endKind: string): string {
  let byLength = root.get(variantId) as Nested<string> | undefined;
  if (!byLength) root.set(variantId, (byLength = new Map()));
  let byStart = byLength.get(length) as Nested<string> | undefined;
  if (!byStart) byLength.set(length, (byStart = new Map()));
  let byEnd = byStart.get(startKind) as Nested<string> | undefined;
  if (!byEnd) byStart.set(startKind, (byEnd = new Map()));
  let head = byEnd.get(endKind) as string | undefined;
  if (head === undefined) byEnd.set(endKind, (head = [variantId, length.toFixed(1), startKind, endKind].join('|')));
  return head;
}

/**
 * `key` followed by one machining operation's part of the group key, made once per key and
 * operation: the same key string comes back for every piece of a kind, so the group map finds it
 * without hashing a new string per profile.
 */
function cachedKeyPart(root: Nested<string>, key: string, m: CutMachiningOperation): string {
  const node = child(child(child(child(child(root, key), m.kind), m.fromEnd), m.offset), m.face);
  const diameter = m.diameter ?? '';
  let joined = node.get(diameter) as string | undefined;
  if (joined === undefined) node.set(diameter, (joined = `${key}|${m.kind}/${m.fromEnd}/${m.offset.toFixed(1)}/${m.face}/${diameter}`));
  return joined;
}

/** The map under `key`, made on first use. */
function child<T>(node: Nested<T>, key: string | number): Nested<T> {
  let next = node.get(key) as Nested<T> | undefined;
  if (!next) node.set(key, (next = new Map()));
  return next;
}

function endTreatment(info: ProfileInfo, end: ProfileEnd, thread: string | undefined, cache: Nested<EndTreatment>): EndTreatment {
  const accessories = accessoriesAt(info, end);
  const word = endWord(info, end);
  const kind = endKind(info, end, accessories);
  // Looked up level by level, without a key path array or a closure per profile end.
  const threadKey = thread ?? '';
  let byWord = cache.get(kind) as Nested<EndTreatment> | undefined;
  if (!byWord) cache.set(kind, (byWord = new Map()));
  let byThread = byWord.get(word) as Nested<EndTreatment> | undefined;
  if (!byThread) byWord.set(word, (byThread = new Map()));
  if (byThread.has(threadKey)) return byThread.get(threadKey) as EndTreatment;
  const made = describeEnd(kind, word, thread);
  byThread.set(threadKey, made);
  return made;
}

/**
 * What happens at a profile end: a foot or caster (the first fitted), else a tap, else a cap, else
 * a plain cut. Loops rather than `find`/`some` with closures: this runs for every profile end.
 */
function endKind(info: ProfileInfo, end: ProfileEnd, accessories: readonly { kind: string }[]): EndTreatment['kind'] {
  return END_KINDS[endKindIndex(info, end, accessories)];
}

/** `endKind` as its place in `END_KINDS` (a number, so the caller indexes a table without a keyed look-up). */
function endKindIndex(info: ProfileInfo, end: ProfileEnd, accessories: readonly { kind: string }[]): number {
  for (let k = 0; k < accessories.length; k++) {
    const kind = accessories[k].kind;
    if (kind === 'caster') return 4;
    if (kind === 'leveling-foot') return 3;
  }
  const machining = info.profile.machining;
  for (let k = 0; k < machining.length; k++) if (machining[k].kind === 'end-tap' && machining[k].fromEnd === end) return 1;
  for (let k = 0; k < accessories.length; k++) if (accessories[k].kind === 'end-cap') return 2;
  return 0;
}

function describeEnd(kind: EndTreatment['kind'], word: string, thread: string | undefined): EndTreatment {
  if (kind === 'foot' || kind === 'caster') {
    return {
      kind,
      ...(thread ? { thread } : {}),
      description: `Tap ${thread ?? 'the centre bore'} in the ${word} end for a ${kind === 'caster' ? 'caster' : 'leveling foot'}`,
    };
  }
  if (kind === 'tap') return { kind: 'tap', ...(thread ? { thread } : {}), description: `Tap ${thread ?? 'the centre bore'} in the ${word} end` };
  if (kind === 'cap') return { kind: 'cap', description: `End cap on the ${word} end` };
  return { kind: 'plain', description: `Square cut, deburred` };
}
