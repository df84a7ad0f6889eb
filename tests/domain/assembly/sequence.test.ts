import { describe, expect, it } from 'vitest';
import { defaultCatalogue } from '@/domain/catalogue';
import { makeFastener } from '@/domain/catalogue/fasteners';
import type { Catalogue } from '@/domain/catalogue/types';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { buildSequence, generateSequence, generateSteps, sequenceOf, sequenceFindings } from '@/domain/assembly';
import { moveStepAfter, moveStepBefore } from '@/domain/assembly/sequenceOperations';
import { buildAnalysisContext } from '@/domain/analysis/context';
import { indexCatalogue } from '@/domain/analysis/catalogueIndex';
import { generateDesign } from '@/domain/design/generators';
import { designDocumentSchema, type DesignDocument } from '@/domain/design/schema';
import { buildPlantRack, buildPrinterEnclosure, buildStandingWorkbench } from '@/domain/fixtures/demoDesigns';

const seqFindings = (d: DesignDocument) => sequenceFindings(buildAnalysisContext(d, indexCatalogue(defaultCatalogue)));
const errorsOf = (d: DesignDocument) => seqFindings(d).filter((f) => f.severity === 'error');
const withGenerated = (d: DesignDocument): DesignDocument => ({ ...d, steps: generateSteps(d) });
const stepIndex = (d: DesignDocument, partId: string) => d.steps.findIndex((s) => s.partIds.includes(partId));

describe('assembly sequence: generation', () => {
  it.each([
    ['printer enclosure', buildPrinterEnclosure],
    ['standing workbench', buildStandingWorkbench],
    ['plant rack', buildPlantRack],
  ])('the generated order of the demo %s passes the feasibility check', (_name, build) => {
    const design = withGenerated(build());
    expect(design.steps.length).toBeGreaterThan(5);
    expect(seqFindings(design)).toEqual([]);
    expect(analyzeDesign(design).findings.filter((f) => f.check === 'sequence')).toEqual([]);
  });

  it('places a captured panel before the last profile that bounds it, and moving it after gives a finding naming both steps', () => {
    const design = withGenerated(buildPrinterEnclosure());
    const shelf = design.panels.find((p) => p.mounting === 'captured' && p.role === 'shelf')!;
    const panelStep = stepIndex(design, shelf.id);
    const closing = Math.max(...shelf.boundedBy!.map((id) => stepIndex(design, id)));
    expect(panelStep).toBeLessThan(closing);

    const moved = moveStepAfter(design, design.steps[panelStep].id, design.steps[closing].id);
    const findings = errorsOf(moved);
    expect(findings).toHaveLength(1);
    const [f] = findings;
    const newPanelStep = stepIndex(moved, shelf.id) + 1;
    const closingStep = closing; // the closing step moved up by one
    expect(f.message).toContain(`step ${newPanelStep} (`);
    expect(f.message).toContain(`step ${closingStep} (`);
    expect(f.message).toContain(`Move step ${newPanelStep} before step ${closingStep}.`);
    expect(f.partIds[0]).toBe(shelf.id);
    expect(shelf.boundedBy).toContain(f.partIds[1]);
    expect(f.fix?.operation).toEqual({ type: 'moveStepBefore', payload: { stepId: moved.steps[newPanelStep - 1].id, beforeStepId: moved.steps[closingStep - 1].id } });
  });

  it('puts slide-in T-nuts in before the joints that close both ends of their profile, and reports an order that does not', () => {
    const rack = buildPlantRack();
    const slideIn: DesignDocument = { ...rack, joints: rack.joints.map((j) => ({ ...j, tNut: 'slide-in' as const })) };
    const design = withGenerated(slideIn);
    expect(errorsOf(design)).toEqual([]);
    // Every slide-in joint on an upright comes before the step that closes the upright's far end.
    const ctx = buildAnalysisContext(design, indexCatalogue(defaultCatalogue));
    for (const post of ctx.profiles.filter((p) => Math.abs(p.profile.direction[1]) > 0.99)) {
      const closers = [...post.startJoints, ...post.endJoints, ...post.startAccessories, ...post.endAccessories].map((x) => stepIndex(design, x.id));
      for (const j of post.joints.filter((j) => !post.startJoints.includes(j) && !post.endJoints.includes(j))) {
        const ends = [post.startJoints, post.endJoints].map((list, k) =>
          Math.min(...[...list, ...(k === 0 ? post.startAccessories : post.endAccessories)].map((x) => stepIndex(design, x.id))),
        );
        expect(Math.max(...ends), `${j.id} on ${post.profile.id}`).toBeGreaterThanOrEqual(stepIndex(design, j.id));
      }
      expect(closers.length).toBeGreaterThan(0);
    }
    // Feet first and end caps next close both ends of every upright before any rail joint.
    const feetStep = design.steps.find((s) => s.title.startsWith('Screw in the feet'))!;
    const caps = design.steps.find((s) => s.title.startsWith('Press on the end caps'))!;
    let broken = moveStepBefore(design, feetStep.id, design.steps[0].id);
    broken = moveStepBefore(broken, caps.id, broken.steps[1].id);
    const messages = errorsOf(broken).filter((f) => f.id.startsWith('sequence:slide-in-closed'));
    expect(messages.length).toBeGreaterThan(0);
    expect(messages[0].message).toMatch(/both its ends are closed before step \d+ .* \(in step 1 .* and step 2 /);
    expect(messages[0].message).toMatch(/Move step \d+ before step 2, or use drop-in T-nuts\./);
  });

  it('builds an upside-down sub-assembly with its feet, then a flip step before the steps done the right way up', () => {
    const table = generateDesign('table', { systemId: 'metric-40', width: 1200, depth: 700, height: 750 });
    const design: DesignDocument = withGenerated({
      ...table,
      steps: [],
      subAssemblies: [{ id: 'frame', name: 'Table frame', profileIds: table.profiles.map((p) => p.id), panelIds: [], buildOrientation: 'upside-down' }],
    });
    const seq = sequenceOf(design);
    const flip = seq.steps.findIndex((s) => s.kind === 'flip');
    expect(flip).toBeGreaterThan(0);
    expect(seq.steps[flip].cautions.map((c) => c.kind)).toContain('tipping');
    for (const s of seq.steps.slice(0, flip)) expect(s.orientation, s.title).toBe('upside-down');
    for (const s of seq.steps.slice(flip + 1)) expect(s.orientation, s.title).toBe('as-placed');
    const feet = design.accessories.filter((a) => a.kind === 'leveling-foot').map((a) => a.id);
    for (const id of feet) expect(stepIndex(design, id)).toBeLessThan(flip);
    expect(errorsOf(design)).toEqual([]);
    // A build step moved after the flip is reported with both steps.
    const moved = moveStepAfter(design, design.steps[1].id, design.steps[flip].id);
    const f = errorsOf(moved).find((x) => x.id.startsWith('sequence:built-after-flip'));
    expect(f?.message).toMatch(/step \d+ .* builds the Table frame upside down, but step \d+ .* has already turned it over/);
  });

  it('lists exactly the 3/16 in, 1/4 in, 1/8 in and 6 mm hex keys for 1/4-20 and 5/16-18 socket heads, #10 button heads and M8 socket heads', () => {
    // Keys: ASME B18.3 (1/4-20 socket 3/16 in, 5/16-18 socket 1/4 in, #10 button 1/8 in), ISO 4762 (M8 socket 6 mm).
    // The same four keys a practitioner names for a comparable build (common practice, no source).
    const button10 = makeFastener('button', '#10', 12.7);
    const handle = { ...defaultCatalogue.accessories.find((a) => a.kind === 'handle')!, id: 'test-handle-10', fasteners: [{ fastenerId: button10.id, quantity: 2 }], tNutCount: 0 };
    const catalogue: Catalogue = { ...defaultCatalogue, fasteners: [...defaultCatalogue.fasteners, button10], accessories: [...defaultCatalogue.accessories, handle] };
    const profile = (id: string, variantId: string, x: number, direction: [number, number, number]) => ({ id, variantId, length: 300, start: [x, 0, 0] as [number, number, number], direction });
    const design = designDocumentSchema.parse({
      schemaVersion: 3,
      name: 'Mixed screws',
      systemId: 'metric-40',
      profiles: [
        profile('a1', 'in-1x1', 0, [0, 1, 0]),
        profile('a2', 'in-1x1', 12.7, [1, 0, 0]),
        profile('b1', 'in-1.5x1.5', 1000, [0, 1, 0]),
        profile('b2', 'in-1.5x1.5', 1019.05, [1, 0, 0]),
        profile('c1', 'm40-40x40', 2000, [0, 1, 0]),
        profile('c2', 'm40-40x40', 2020, [1, 0, 0]),
      ],
      joints: [
        { id: 'ja', kind: 'end-screw', connectorId: 'in1-end-screw', members: [{ profileId: 'a2', at: 'start' }, { profileId: 'a1', at: 'span', along: 0 }], fastenerHead: 'socket' },
        { id: 'jb', kind: 'end-screw', connectorId: 'in1.5-end-screw', members: [{ profileId: 'b2', at: 'start' }, { profileId: 'b1', at: 'span', along: 0 }], fastenerHead: 'socket' },
        { id: 'jc', kind: 'end-screw', connectorId: 'm40-end-screw', members: [{ profileId: 'c2', at: 'start' }, { profileId: 'c1', at: 'span', along: 0 }], fastenerHead: 'socket' },
      ],
      accessories: [{ id: 'h1', kind: 'handle', partId: 'test-handle-10', profileId: 'a1', along: 150 }],
    });
    const seq = generateSequence(design, catalogue);
    expect(seq.tools.map((t) => t.label).sort()).toEqual(['1/4 in', '1/8 in', '3/16 in', '6 mm']);
    expect(Object.fromEntries(seq.tools.map((t) => [t.label, t.standard]))).toEqual({ '1/8 in': 'ASME B18.3', '3/16 in': 'ASME B18.3', '1/4 in': 'ASME B18.3', '6 mm': 'ISO 4762' });
    // Each step names the keys of its own screws.
    const handleStep = seq.steps[seq.stepOfPart.get('h1')!];
    expect(handleStep.tools.map((t) => t.label)).toEqual(['1/8 in']);
  });

  it('gives profiles, panels, T-nuts and feet insertion directions along their axis, slot or face, and explode offsets against them', () => {
    const design = withGenerated(buildPrinterEnclosure());
    const seq = sequenceOf(design);
    for (const m of seq.motionOf.values()) {
      expect(Math.hypot(...m.insertionDirection)).toBeCloseTo(1, 9);
      const d = Math.hypot(...m.explodeOffset);
      expect(d).toBeGreaterThan(20);
      expect(d).toBeLessThanOrEqual(400);
      // The offset points back along the direction.
      expect(m.explodeOffset[0] * m.insertionDirection[0] + m.explodeOffset[1] * m.insertionDirection[1] + m.explodeOffset[2] * m.insertionDirection[2]).toBeCloseTo(-d, 6);
    }
    // A captured shelf slides in its plane (normal Y): no Y component.
    const shelf = design.panels.find((p) => p.role === 'shelf' && p.mounting === 'captured')!;
    expect(seq.motionOf.get(shelf.id)!.insertionDirection[1]).toBe(0);
    // Feet thread up into the bottom ends of the uprights.
    const foot = design.accessories.find((a) => a.kind === 'leveling-foot')!;
    expect(seq.motionOf.get(foot.id)!.insertionDirection).toEqual([0, 1, 0]);
    // Drop-in T-nuts of a rail-to-upright joint move square to the upright's axis.
    const nuts = seq.steps.flatMap((s) => s.tNuts);
    expect(nuts.length).toBe(design.joints.length);
    for (const n of nuts) {
      const host = design.profiles.find((p) => p.id === n.profileId)!;
      const along = n.insertionDirection[0] * host.direction[0] + n.insertionDirection[1] * host.direction[1] + n.insertionDirection[2] * host.direction[2];
      expect(along).toBeCloseTo(0, 9);
    }
  });

  it('warns two people for a step above the lift limit and eye protection for machined profiles (common practice, no source)', () => {
    const bench = withGenerated(buildStandingWorkbench());
    const seq = buildSequence(bench, bench.steps);
    const all = seq.steps.flatMap((s) => s.cautions.map((c) => c.kind));
    expect(all).toContain('eye-protection');
    const heavy = seq.steps.filter((s) => s.massKg > 23);
    for (const s of heavy) expect(s.cautions.map((c) => c.kind)).toContain('two-person-lift');
    for (const s of seq.steps.filter((x) => x.massKg <= 23)) expect(s.cautions.map((c) => c.kind)).not.toContain('two-person-lift');
  });
});
