/**
 * The enriched assembly sequence of a design: its saved steps (or generated ones when none are
 * saved) with, per step, the parts by role, hardware, hex keys, cautions, mass and motions.
 * Masses kg, lengths mm.
 */
import { defaultCatalogue, fastenerWithHead } from '../catalogue';
import type { Catalogue, Fastener } from '../catalogue/types';
import { indexCatalogue, type CatalogueIndex } from '../analysis/catalogueIndex';
import type { AssemblyStep, BuildOrientation, DesignDocument } from '../design/schema';
import { generateSteps } from './generateSteps';
import { computeMotions } from './motions';
import type { AssemblySequence, SequenceStep, StepCaution, StepHardware, StepTool } from './types';

/**
 * Above this mass a lift or a turn-over is a two-person job, kg. The load constant of the NIOSH
 * revised lifting equation (23 kg, from memory), used here as common practice.
 */
export const TWO_PERSON_LIFT_KG = 23;

const COMMON_PRACTICE = 'common practice, no source';

/** Hex keys for a set of screws, one per key size and standard, smallest first. */
export function hexKeysFor(fasteners: Iterable<Fastener>): StepTool[] {
  const keys = new Map<string, StepTool>();
  for (const f of fasteners) {
    const id = `hex-key-${f.hexKey.label.replace(/[^A-Za-z0-9]+/g, '-')}-${f.hexKey.standard.replace(/[^A-Za-z0-9]+/g, '-')}`;
    const tool = keys.get(id) ?? { id, kind: 'hex-key' as const, label: f.hexKey.label, mm: f.hexKey.mm, standard: f.hexKey.standard, screws: [] };
    const screw = `${f.head} head ${f.thread}`;
    if (!tool.screws.includes(screw)) tool.screws.push(screw);
    keys.set(id, tool);
  }
  return [...keys.values()].sort((a, b) => a.mm - b.mm || a.label.localeCompare(b.label)).map((t) => ({ ...t, screws: t.screws.sort() }));
}

interface PartTables {
  profiles: Map<string, DesignDocument['profiles'][number]>;
  panels: Map<string, DesignDocument['panels'][number]>;
  joints: Map<string, DesignDocument['joints'][number]>;
  accessories: Map<string, DesignDocument['accessories'][number]>;
}

function tablesOf(design: DesignDocument): PartTables {
  return {
    profiles: new Map(design.profiles.map((p) => [p.id, p])),
    panels: new Map(design.panels.map((p) => [p.id, p])),
    joints: new Map(design.joints.map((j) => [j.id, j])),
    accessories: new Map(design.accessories.map((a) => [a.id, a])),
  };
}

/** Hardware and screws of some joints and accessories (quantities per catalogue part). */
function hardwareOf(jointIds: string[], accessoryIds: string[], t: PartTables, cat: CatalogueIndex): { hardware: StepHardware[]; fasteners: Fastener[] } {
  const lines = new Map<string, StepHardware>();
  const fasteners = new Map<string, Fastener>();
  const add = (category: StepHardware['category'], id: string, name: string, quantity: number) => {
    const key = `${category}|${id}`;
    const line = lines.get(key) ?? { catalogueId: id, category, name, quantity: 0 };
    line.quantity += quantity;
    lines.set(key, line);
  };
  for (const jid of jointIds) {
    const joint = t.joints.get(jid);
    const connector = joint ? cat.connectors.get(joint.connectorId) : undefined;
    if (!joint || !connector) continue;
    if (connector.unitMass > 0 || connector.price > 0) add('connector', connector.id, connector.name, joint.quantity);
    for (const use of connector.fasteners) {
      const f = fastenerWithHead(cat.catalogue, use.fastenerId, joint.fastenerHead);
      if (!f) continue;
      fasteners.set(f.id, f);
      add('fastener', f.id, f.name, use.quantity * joint.quantity);
    }
    if (connector.tNutCount > 0) {
      const host = t.profiles.get(joint.members[1]?.profileId ?? '') ?? t.profiles.get(joint.members[0].profileId);
      const system = (host && cat.variants.get(host.variantId)?.systemId) ?? '';
      const nut = cat.tNutsBySystemKind.get(`${system}|${joint.tNut}`);
      if (nut) add('t-nut', nut.id, nut.name, connector.tNutCount * joint.quantity);
    }
  }
  for (const aid of accessoryIds) {
    const acc = t.accessories.get(aid);
    const part = acc ? cat.accessories.get(acc.partId) : undefined;
    if (!acc || !part) continue;
    for (const use of part.fasteners ?? []) {
      const f = cat.fasteners.get(use.fastenerId);
      if (!f) continue;
      fasteners.set(f.id, f);
      add('fastener', f.id, f.name, use.quantity * acc.quantity);
    }
  }
  return { hardware: [...lines.values()], fasteners: [...fasteners.values()] };
}

function profileKg(p: DesignDocument['profiles'][number], cat: CatalogueIndex): number {
  return ((cat.variants.get(p.variantId)?.massPerMetre ?? 0) * p.length) / 1000;
}

function panelKg(p: DesignDocument['panels'][number], cat: CatalogueIndex): number {
  const density = cat.panelMaterials.get(p.materialId)?.density ?? 0;
  return (p.rect.width / 1000) * (p.rect.height / 1000) * (p.thickness / 1000) * density;
}

/**
 * The sequence of `design`: its saved steps, or generated ones when it has none. Pure; masses kg,
 * lengths mm.
 */
export function sequenceOf(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): AssemblySequence {
  if (design.steps.length > 0) return buildSequence(design, design.steps, catalogue, 'saved');
  return buildSequence(design, generateSteps(design, catalogue), catalogue, 'generated');
}

/** A fresh generated sequence, ignoring any saved steps. */
export function generateSequence(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): AssemblySequence {
  return buildSequence(design, generateSteps(design, catalogue), catalogue, 'generated');
}

/** Enriches document steps (in their order) into a sequence. */
export function buildSequence(design: DesignDocument, steps: AssemblyStep[], catalogue: Catalogue = defaultCatalogue, source: AssemblySequence['source'] = 'saved'): AssemblySequence {
  const cat = indexCatalogue(catalogue);
  const t = tablesOf(design);
  const subs = new Map(design.subAssemblies.map((s) => [s.id, s]));
  const stepOfPart = new Map<string, number>();
  steps.forEach((s, i) => s.partIds.forEach((id) => stepOfPart.has(id) || stepOfPart.set(id, i)));
  const { motions, tNuts } = computeMotions({ design, catalogue: cat, stepOf: stepOfPart });
  const allFasteners: Fastener[] = [];

  const out: SequenceStep[] = steps.map((s, index) => {
    const profileIds = s.partIds.filter((id) => t.profiles.has(id));
    const panelIds = s.partIds.filter((id) => t.panels.has(id));
    const jointIds = s.partIds.filter((id) => t.joints.has(id));
    const accessoryIds = s.partIds.filter((id) => t.accessories.has(id));
    const { hardware, fasteners } = hardwareOf(jointIds, accessoryIds, t, cat);
    allFasteners.push(...fasteners);
    const sub = s.subAssemblyId ? subs.get(s.subAssemblyId) : undefined;
    const orientation: BuildOrientation = s.orientation ?? sub?.buildOrientation ?? 'as-placed';
    let massKg = profileIds.reduce((kg, id) => kg + profileKg(t.profiles.get(id)!, cat), 0) + panelIds.reduce((kg, id) => kg + panelKg(t.panels.get(id)!, cat), 0);
    if ((s.kind === 'join' || s.kind === 'flip') && sub) {
      // What is lifted or turned: the whole sub-assembly with its panels.
      massKg = sub.profileIds.reduce((kg, id) => kg + (t.profiles.has(id) ? profileKg(t.profiles.get(id)!, cat) : 0), 0) + sub.panelIds.reduce((kg, id) => kg + (t.panels.has(id) ? panelKg(t.panels.get(id)!, cat) : 0), 0);
    }
    const cautions: StepCaution[] = [];
    if (massKg > TWO_PERSON_LIFT_KG) {
      cautions.push({ kind: 'two-person-lift', message: `About ${Math.round(massKg)} kg is moved in this step: lift and hold it with two people.`, basis: `${COMMON_PRACTICE}; above ${TWO_PERSON_LIFT_KG} kg` });
    }
    if (profileIds.some((id) => t.profiles.get(id)!.machining.length > 0)) {
      cautions.push({ kind: 'eye-protection', message: 'These profiles have holes or tapped ends: wear eye protection if you drill or tap them yourself, and clamp the work.', basis: COMMON_PRACTICE });
    }
    if (s.kind === 'flip' || accessoryIds.some((id) => ['leveling-foot', 'caster'].includes(t.accessories.get(id)!.kind))) {
      cautions.push({ kind: 'tipping', message: 'Turn or tip the piece with a helper and never work under a raised frame.', basis: COMMON_PRACTICE });
    }
    if (panelIds.some((id) => t.panels.get(id)!.role === 'door') || s.kind === 'join') {
      cautions.push({ kind: 'pinch', message: 'Keep fingers clear of the gap while the parts come together.', basis: COMMON_PRACTICE });
    }
    return {
      id: s.id,
      index,
      title: s.title,
      ...(s.notes ? { notes: s.notes } : {}),
      ...(s.caution ? { caution: s.caution } : {}),
      kind: s.kind,
      ...(s.subAssemblyId ? { subAssemblyId: s.subAssemblyId } : {}),
      orientation,
      partIds: [...s.partIds],
      profileIds,
      panelIds,
      jointIds,
      accessoryIds,
      hardware,
      tools: hexKeysFor(fasteners),
      cautions,
      massKg,
      motions: s.partIds.map((id) => motions.get(id)).filter((m): m is NonNullable<typeof m> => !!m),
      tNuts: jointIds.map((id) => tNuts.get(id)).filter((m): m is NonNullable<typeof m> => !!m),
    };
  });
  return { source, steps: out, tools: hexKeysFor(allFasteners), stepOfPart, motionOf: motions };
}
