/**
 * Generates the build order of any design as document steps (`AssemblyStep[]`), the way a shop
 * builds a frame (common practice, no source):
 *
 * 1. each sub-assembly is built on its own, in its build orientation: uprights first, then the
 *    horizontal members level by level from the bottom; a sub-assembly built upside down gets its
 *    feet before it is turned over, and every sub-assembly not built as placed gets a flip step;
 * 2. the rest of the frame is built onto the first sub-assembly (or stands on its own);
 * 3. the other sub-assemblies are joined one by one along their join direction;
 * 4. face-mounted panels, doors with their hardware, feet, gaskets and end caps finish the piece.
 *
 * Captured panels go in just before the member that closes their slot (within a level, the panel
 * waits for the other members of its frame and goes before the front-most or top-most one); a
 * joint goes in the step that places the last of its profiles. Lengths mm.
 */
import type { Catalogue } from '../catalogue/types';
import type { Accessory, AssemblyStep, BuildOrientation, DesignDocument, Profile, StepKind, Vec3 } from '../design/schema';
import { createIdAllocator } from '../design/ids';

interface Stage {
  kind: StepKind;
  title: string;
  subAssemblyId?: string;
  orientation?: BuildOrientation;
  profileIds: string[];
  /** Non-profile parts that go with the stage as they are (joints are added later). */
  extraIds: string[];
  /** For join stages: captured panels that must go in before it. */
  prePanels: string[];
  notes?: string;
  insertionDirection?: Vec3;
  /** Profile stage that may be split around captured panels it closes. */
  splittable: boolean;
}

const VERTICAL = 0.99;
const FINISH_FOOT = new Set(['leveling-foot', 'caster']);

/** "Bottom rail, back" -> ["Bottom rail", "back"]. */
function splitLabel(label: string | undefined): [string, string] | null {
  if (!label) return null;
  const i = label.indexOf(',');
  return i < 0 ? [label, ''] : [label.slice(0, i).trim(), label.slice(i + 1).trim()];
}

function plural(word: string): string {
  return /s$/.test(word) ? word : `${word}s`;
}

/** A title from the profiles' labels: "Bottom rails: back, left, right", or a plain count. */
function profilesTitle(profiles: Profile[], fallback: string): string {
  const parts = profiles.map((p) => splitLabel(p.label));
  if (parts.length > 0 && parts.every((x) => x !== null && x[0] === parts[0]![0])) {
    const head = parts[0]![0];
    const tails = parts.map((x) => x![1]).filter(Boolean);
    if (profiles.length === 1) return tails.length ? `${head}: ${tails[0]}` : head;
    return tails.length > 0 && tails.length <= 4 ? `${plural(head)}: ${tails.join(', ')}` : `${plural(head)} (${profiles.length})`;
  }
  return fallback;
}

function levelName(y: number): string {
  return `${Math.round(y)} mm`;
}

/**
 * Document steps for a design in a feasible build order (see file comment). Pure; lengths mm.
 * Ids are new `step-N` ids not used elsewhere in the design.
 */
export function generateSteps(design: DesignDocument, _catalogue?: Catalogue): AssemblyStep[] {
  const profileById = new Map(design.profiles.map((p) => [p.id, p]));
  const groupOf = new Map<string, string>(); // profile id -> sub-assembly id ('' = main body)
  for (const sub of design.subAssemblies) for (const id of sub.profileIds) if (profileById.has(id) && !groupOf.has(id)) groupOf.set(id, sub.id);
  const mainProfiles = design.profiles.filter((p) => !groupOf.has(p.id));

  const feetByProfile = new Map<string, Accessory[]>();
  for (const a of design.accessories) {
    if (!FINISH_FOOT.has(a.kind) || !a.profileId) continue;
    const list = feetByProfile.get(a.profileId);
    if (list) list.push(a);
    else feetByProfile.set(a.profileId, [a]);
  }
  const placedAccessories = new Set<string>();

  const stages: Stage[] = [];
  const profileStages = (profiles: Profile[], subAssemblyId: string | undefined, orientation: BuildOrientation, prefix: string) => {
    const uprights = profiles.filter((p) => Math.abs(p.direction[1]) > VERTICAL);
    const others = profiles.filter((p) => Math.abs(p.direction[1]) <= VERTICAL);
    if (uprights.length > 0) {
      stages.push({
        kind: 'place',
        title: `${prefix}${orientation === 'as-placed' ? 'Stand' : 'Lay out'} the ${uprights.length === 1 ? 'upright' : `${uprights.length} uprights`}`,
        subAssemblyId,
        orientation,
        profileIds: uprights.map((p) => p.id),
        extraIds: [],
        prePanels: [],
        splittable: true,
        insertionDirection: [0, 1, 0],
        ...(orientation === 'as-placed' && !subAssemblyId ? { notes: 'Brace the uprights until the first members are joined to them.' } : {}),
      });
    }
    // Horizontal members by level: the height of their mid-point, rounded to 1 mm.
    const levels = new Map<number, Profile[]>();
    for (const p of others) {
      const y = Math.round(p.start[1] + (p.direction[1] * p.length) / 2);
      const list = levels.get(y);
      if (list) list.push(p);
      else levels.set(y, [p]);
    }
    for (const y of [...levels.keys()].sort((a, b) => a - b)) {
      const list = levels.get(y)!;
      stages.push({
        kind: 'place',
        title: `${prefix}${profilesTitle(list, `Members at ${levelName(y)}`)}`,
        subAssemblyId,
        orientation,
        profileIds: list.map((p) => p.id),
        extraIds: [],
        prePanels: [],
        splittable: true,
      });
    }
  };

  const subs = design.subAssemblies.filter((s) => design.profiles.some((p) => groupOf.get(p.id) === s.id));
  const base = subs[0];
  const joining = subs.slice(1);
  for (const sub of subs) {
    const orientation = sub.buildOrientation;
    profileStages(
      design.profiles.filter((p) => groupOf.get(p.id) === sub.id),
      sub.id,
      orientation,
      `${sub.name}: `,
    );
    if (orientation === 'upside-down') {
      const feet = sub.profileIds.flatMap((id) => feetByProfile.get(id) ?? []).map((a) => a.id);
      if (feet.length > 0) {
        feet.forEach((id) => placedAccessories.add(id));
        stages.push({ kind: 'finish', title: `${sub.name}: thread in the feet`, subAssemblyId: sub.id, orientation, profileIds: [], extraIds: feet, prePanels: [], splittable: false, notes: 'Feet go in while the piece is upside down, before it is turned over.' });
      }
    }
    if (orientation !== 'as-placed') {
      stages.push({ kind: 'flip', title: `Turn the ${sub.name.toLowerCase()} to its final orientation`, subAssemblyId: sub.id, orientation: 'as-placed', profileIds: [], extraIds: [], prePanels: [], splittable: false });
    }
  }
  profileStages(mainProfiles, undefined, 'as-placed', '');
  for (const sub of joining) {
    stages.push({
      kind: 'join',
      title: `Join the ${sub.name.toLowerCase()}`,
      subAssemblyId: sub.id,
      orientation: 'as-placed',
      profileIds: [],
      extraIds: [],
      prePanels: [],
      splittable: false,
      ...(sub.joinDirection ? { insertionDirection: sub.joinDirection } : {}),
    });
  }
  void base;

  // When each profile is in its final place: its own stage, or its sub-assembly's join stage.
  const buildStage = new Map<string, number>();
  stages.forEach((s, i) => s.profileIds.forEach((id) => buildStage.set(id, i)));
  const joinStageOf = new Map<string, number>();
  stages.forEach((s, i) => {
    if (s.kind === 'join' && s.subAssemblyId) joinStageOf.set(s.subAssemblyId, i);
  });
  const mountStage = (profileId: string): number => {
    const sub = groupOf.get(profileId);
    const join = sub ? joinStageOf.get(sub) : undefined;
    return join ?? buildStage.get(profileId) ?? -1;
  };

  // Captured panels: the stage that closes them.
  const panelsClosedIn = new Map<number, string[]>();
  const looseCaptured: string[] = [];
  for (const panel of design.panels) {
    if (panel.mounting !== 'captured') continue;
    const bounding = (panel.boundedBy ?? []).filter((id) => profileById.has(id));
    if (bounding.length === 0) {
      looseCaptured.push(panel.id);
      continue;
    }
    // Within one sub-assembly the panel goes in during its build; across groups, when they meet.
    const groups = new Set(bounding.map((id) => groupOf.get(id) ?? ''));
    const sameSub = groups.size === 1 && !groups.has('');
    const closing = Math.max(...bounding.map((id) => (sameSub ? (buildStage.get(id) ?? -1) : mountStage(id))));
    const stage = stages[closing];
    if (stage.kind === 'join') stage.prePanels.push(panel.id);
    else {
      const list = panelsClosedIn.get(closing);
      if (list) list.push(panel.id);
      else panelsClosedIn.set(closing, [panel.id]);
    }
  }

  // Expand stages to document steps.
  // Regenerating replaces the steps, so their old ids are free again.
  const ids = createIdAllocator({ ...design, steps: [] });
  const steps: AssemblyStep[] = [];
  const push = (s: Omit<AssemblyStep, 'id'>) => {
    if (s.partIds.length === 0 && s.kind !== 'flip' && s.kind !== 'join') return;
    steps.push({ id: ids.next('step'), ...s });
  };
  const base0 = (stage: Stage) => ({
    ...(stage.subAssemblyId ? { subAssemblyId: stage.subAssemblyId } : {}),
    ...(stage.orientation && stage.orientation !== 'as-placed' ? { orientation: stage.orientation } : stage.kind === 'flip' || stage.kind === 'join' ? { orientation: 'as-placed' as const } : {}),
  });
  const panelById = new Map(design.panels.map((p) => [p.id, p]));
  const panelTitle = (ids: string[]) => {
    const labels = ids.map((id) => panelById.get(id)?.label).filter((x): x is string => !!x);
    if (ids.length === 1 && labels.length === 1) return `Slide in the ${labels[0].charAt(0).toLowerCase()}${labels[0].slice(1)}`;
    return `Slide in ${ids.length} captured panels`;
  };
  const slideDirection = (panelId: string, closerId: string | undefined): Vec3 | undefined => {
    const panel = panelById.get(panelId);
    const closer = closerId ? profileById.get(closerId) : undefined;
    if (!panel || !closer) return undefined;
    const mid = closer.start.map((c, k) => c + (closer.direction[k] * closer.length) / 2);
    const d = mid.map((c, k) => panel.rect.center[k] - c);
    // The panel comes from the closer's side and moves away from it, along the dominant in-plane axis.
    const n = { x: 0, y: 1, z: 2 }[panel.rect.normal];
    let axis = -1;
    let best = 0;
    for (let k = 0; k < 3; k++) if (k !== n && Math.abs(d[k]) > best) { best = Math.abs(d[k]); axis = k; }
    if (axis < 0) return undefined;
    const v: Vec3 = [0, 0, 0];
    v[axis] = Math.sign(d[axis]);
    return v;
  };

  stages.forEach((stage, index) => {
    if (stage.prePanels.length > 0) {
      push({ kind: 'slide-in', title: `${panelTitle(stage.prePanels)} before the ${stage.title.replace(/^Join the /, '')} goes on`, partIds: stage.prePanels, notes: 'They must be in before the last member closes their slots.' });
    }
    const panels = panelsClosedIn.get(index) ?? [];
    if (!stage.splittable || panels.length === 0) {
      push({ kind: stage.kind, title: stage.title, partIds: [...stage.profileIds, ...stage.extraIds], ...base0(stage), ...(stage.notes ? { notes: stage.notes } : {}), ...(stage.insertionDirection ? { insertionDirection: stage.insertionDirection } : {}) });
      return;
    }
    // Split the stage: each panel before its closer, after the rest of its frame in this stage.
    const inStage = new Set(stage.profileIds);
    const closerOf = new Map<string, string>();
    for (const pid of panels) {
      const panel = panelById.get(pid)!;
      const frame = (panel.boundedBy ?? []).filter((id) => inStage.has(id));
      const score = (id: string) => {
        const p = profileById.get(id)!;
        const mid = p.start.map((c, k) => c + (p.direction[k] * p.length) / 2);
        // Vertical panels close from above; horizontal ones from the front (-Z).
        return panel.rect.normal === 'y' ? -mid[2] : mid[1];
      };
      closerOf.set(pid, [...frame].sort((a, b) => score(b) - score(a))[0]);
    }
    // Layers: item -> layer; panels after their in-stage frame (except closer), closers after their panels.
    const items = [...stage.profileIds, ...panels];
    const before = new Map<string, Set<string>>(items.map((i) => [i, new Set<string>()]));
    for (const pid of panels) {
      const closer = closerOf.get(pid)!;
      before.get(closer)!.add(pid);
      for (const id of panelById.get(pid)!.boundedBy ?? []) if (inStage.has(id) && id !== closer) before.get(pid)!.add(id);
    }
    let layers = layer(items, before);
    if (!layers) {
      for (const pid of panels) for (const id of [...before.get(pid)!]) before.get(pid)!.delete(id);
      layers = layer(items, before)!;
    }
    for (const group of layers) {
      const groupPanels = group.filter((id) => panelById.has(id));
      const groupProfiles = group.filter((id) => !panelById.has(id));
      if (groupPanels.length > 0) {
        push({
          kind: 'slide-in',
          title: panelTitle(groupPanels),
          partIds: groupPanels,
          ...base0(stage),
          notes: 'Slide the sheet along its slots; it must be in before the member that closes them.',
          ...(slideDirection(groupPanels[0], closerOf.get(groupPanels[0])) ? { insertionDirection: slideDirection(groupPanels[0], closerOf.get(groupPanels[0]))! } : {}),
        });
      }
      if (groupProfiles.length > 0) {
        const profiles = groupProfiles.map((id) => profileById.get(id)!);
        const title = groupProfiles.length === stage.profileIds.length ? stage.title : `${stage.subAssemblyId ? `${design.subAssemblies.find((s) => s.id === stage.subAssemblyId)?.name}: ` : ''}${profilesTitle(profiles, `${profiles.length} members`)}`;
        push({ kind: 'place', title, partIds: groupProfiles, ...base0(stage) });
      }
    }
  });

  // Joints: with the step that places the last of their profiles (their own group's build step when
  // all members share a group, else the step that brings the groups together).
  const stepOfProfile = new Map<string, number>();
  steps.forEach((s, i) => s.partIds.forEach((id) => profileById.has(id) && stepOfProfile.set(id, i)));
  const joinStepOf = new Map<string, number>();
  steps.forEach((s, i) => {
    if (s.kind === 'join' && s.subAssemblyId) joinStepOf.set(s.subAssemblyId, i);
  });
  const jointsFor = new Map<number, string[]>();
  for (const joint of design.joints) {
    const members = joint.members.map((m) => m.profileId).filter((id) => profileById.has(id));
    if (members.length === 0) continue;
    const groups = new Set(members.map((id) => groupOf.get(id) ?? ''));
    let at = -1;
    for (const id of members) {
      const own = stepOfProfile.get(id) ?? -1;
      const sub = groupOf.get(id);
      const mounted = groups.size > 1 && sub ? (joinStepOf.get(sub) ?? own) : own;
      at = Math.max(at, mounted);
    }
    if (at < 0) continue;
    const list = jointsFor.get(at);
    if (list) list.push(joint.id);
    else jointsFor.set(at, [joint.id]);
  }
  jointsFor.forEach((jointIds, i) => steps[i].partIds.push(...jointIds));

  // Finishing.
  const rest = (pred: (a: Accessory) => boolean) => design.accessories.filter((a) => !placedAccessories.has(a.id) && pred(a)).map((a) => {
    placedAccessories.add(a.id);
    return a.id;
  });
  const finish = (s: Omit<AssemblyStep, 'id'>) => push(s);
  if (looseCaptured.length > 0) finish({ kind: 'slide-in', title: panelTitle(looseCaptured), partIds: looseCaptured });
  const doors = design.panels.filter((p) => p.mounting === 'face' && p.role === 'door').map((p) => p.id);
  const faces = design.panels.filter((p) => p.mounting === 'face' && p.role !== 'door');
  const doorSet = new Set(doors);
  for (const face of faces) {
    const hardware = rest((a) => a.panelId === face.id);
    const down = face.rect.normal === 'y' && face.rect.center[1] > 0;
    finish({ kind: 'place', title: `Fit the ${(face.label ?? 'panel').toLowerCase()}`, partIds: [face.id, ...hardware], ...(down ? { insertionDirection: [0, -1, 0] as Vec3, notes: 'Screw it down into T-nuts in the members below.' } : {}) });
  }
  const track = rest((a) => a.kind === 'door-track');
  if (track.length > 0) finish({ kind: 'place', title: 'Press in the door track', partIds: track });
  if (doors.length > 0) {
    const hardware = rest((a) => !!a.panelId && doorSet.has(a.panelId));
    finish({ kind: 'place', title: doors.length === 1 ? 'Hang the door' : 'Hang the doors', partIds: [...doors, ...hardware], notes: 'Check the doors swing clear before tightening the hinges.' });
  }
  const feet = rest((a) => FINISH_FOOT.has(a.kind));
  if (feet.length > 0) finish({ kind: 'finish', title: 'Screw in the feet and level the frame', partIds: feet, insertionDirection: [0, 1, 0], notes: 'Tip the frame with a helper; never work under a raised frame.' });
  const seals = rest((a) => a.kind === 'gasket' || a.kind === 'slot-cover');
  if (seals.length > 0) finish({ kind: 'finish', title: 'Press in the gaskets and slot covers', partIds: seals });
  const other = rest((a) => a.kind !== 'end-cap');
  if (other.length > 0) finish({ kind: 'place', title: 'Fit the remaining hardware', partIds: other });
  const caps = rest((a) => a.kind === 'end-cap');
  if (caps.length > 0) finish({ kind: 'finish', title: 'Press on the end caps', partIds: caps, insertionDirection: [0, -1, 0] });
  return steps;
}

/** Kahn layering: items in groups, each after everything in `before`; null on a cycle. */
function layer(items: string[], before: Map<string, Set<string>>): string[][] | null {
  const waiting = new Map<string, number>();
  const after = new Map<string, string[]>();
  for (const i of items) {
    waiting.set(i, before.get(i)!.size);
    for (const b of before.get(i)!) {
      const list = after.get(b);
      if (list) list.push(i);
      else after.set(b, [i]);
    }
  }
  const out: string[][] = [];
  let ready = items.filter((i) => waiting.get(i) === 0);
  let done = 0;
  while (ready.length > 0) {
    out.push(ready);
    done += ready.length;
    const next: string[] = [];
    for (const r of ready) {
      for (const i of after.get(r) ?? []) {
        const w = waiting.get(i)! - 1;
        waiting.set(i, w);
        if (w === 0) next.push(i);
      }
    }
    ready = next;
  }
  return done === items.length ? out : null;
}
