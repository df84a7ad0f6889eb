import { describe, expect, it } from 'vitest';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { createEmptyDesign } from '@/domain/design/create';
import { addJoint, addPanel, addProfile, removeParts } from '@/domain/design/operations';
import { addFrameGroup, applyDesignOperation as applyOperation, regenerateFrameGroup } from '@/domain/design/applyDesignOperation';
import { findOpenings } from '@/domain/design/openings';
import { parseDesignDocument } from '@/domain/design/parse';
import type { DesignDocument, Panel, Profile } from '@/domain/design/schema';

const tableParams = { systemId: 'metric-40', width: 1200, depth: 700, height: 900, feet: 'leveling-foot', lowerFrame: true, lowerShelf: false };

function tableDesign(): DesignDocument {
  return addFrameGroup(createEmptyDesign({ name: 'Bench', systemId: 'metric-40' }), { generatorId: 'table', params: tableParams, placement: 'replace' });
}

const byLabel = (design: DesignDocument, label: string): Profile => {
  const found = design.profiles.find((p) => p.label === label);
  if (!found) throw new Error(`no profile labelled ${label}: ${design.profiles.map((p) => p.label).join(', ')}`);
  return found;
};

/** A captured panel added by hand in the opening on the side facing the given axis and sign. */
function withHandPanel(design: DesignDocument, normal: 'x' | 'z', side: 1 | -1, label: string): DesignDocument {
  const axis = normal === 'x' ? 0 : 2;
  const opening = findOpenings(design)
    .filter((o) => o.rect.normal === normal && Math.sign(o.rect.center[axis]) === side)
    .sort((a, b) => a.rect.height - b.rect.height)
    .pop();
  if (!opening) throw new Error('no side opening');
  return addPanel(design, { materialId: 'plywood', thickness: 6, mounting: 'captured', boundedBy: opening.boundedBy, rect: opening.rect, label });
}

const panelNamed = (design: DesignDocument, label: string): Panel | undefined => design.panels.find((p) => p.label === label);

describe('frame groups', () => {
  it('a starter records its parameters and every part it made', () => {
    const design = tableDesign();
    const [group] = design.frameGroups!;
    expect(group.generatorId).toBe('table');
    expect(group.params.width).toBe(1200);
    expect(group.params.lowerShelf).toBe(false);
    const own = new Set(group.partIds);
    expect(design.profiles.every((p) => own.has(p.id))).toBe(true);
    expect(design.joints.every((j) => own.has(j.id))).toBe(true);
    expect(parseDesignDocument(JSON.parse(JSON.stringify(design))).ok).toBe(true);
  });

  it('changing the width regenerates the rails, keeps their ids and the design stays valid', () => {
    const design = tableDesign();
    const rail = byLabel(design, design.profiles.find((p) => p.direction[0] === 1)!.label!);
    const wider = regenerateFrameGroup(design, 'fg-1', { width: 1400 });
    const after = wider.profiles.find((p) => p.id === rail.id)!;
    expect(after.label).toBe(rail.label);
    expect(after.length).toBeCloseTo(rail.length + 200, 6);
    expect(wider.joints.length).toBe(design.joints.length);
    expect(parseDesignDocument(JSON.parse(JSON.stringify(wider))).ok).toBe(true);
    expect(analyzeDesign(wider).findings.filter((f) => f.severity === 'error')).toEqual([]);
  });

  it('regenerating keeps a panel added by hand that still fits, resized to its opening', () => {
    const design = withHandPanel(withHandPanel(tableDesign(), 'x', -1, 'Side panel by hand'), 'z', -1, 'Front panel by hand');
    const before = panelNamed(design, 'Front panel by hand')!;
    const wider = regenerateFrameGroup(design, 'fg-1', { width: 1400 });
    const side = panelNamed(wider, 'Side panel by hand');
    const front = panelNamed(wider, 'Front panel by hand');
    expect(side).toBeDefined();
    expect(front?.id).toBe(before.id);
    // The front opening runs along X, so it grows with the width by the same 200 mm.
    expect(front!.rect.width).toBeCloseTo(before.rect.width + 200, 6);
    expect(wider.frameGroups![0].unfit).toEqual([]);
    expect(analyzeDesign(wider).findings.filter((f) => f.check === 'frame-group')).toEqual([]);
    expect(analyzeDesign(wider).findings.filter((f) => f.check === 'panel-fit' && f.severity !== 'note')).toEqual([]);
  });

  it('regenerating reports a panel added by hand that no longer fits, and takes it out', () => {
    const design = withHandPanel(tableDesign(), 'x', -1, 'Side panel by hand');
    const noLowerFrame = regenerateFrameGroup(design, 'fg-1', { lowerFrame: false });
    expect(panelNamed(noLowerFrame, 'Side panel by hand')).toBeUndefined();
    const findings = analyzeDesign(noLowerFrame).findings.filter((f) => f.check === 'frame-group');
    expect(findings).toHaveLength(1);
    expect(findings[0].severity).toBe('warning');
    expect(findings[0].message).toContain('Side panel by hand');
    expect(findings[0].message).toContain('no longer fits');
    expect(parseDesignDocument(JSON.parse(JSON.stringify(noLowerFrame))).ok).toBe(true);
  });

  it('a joint added by hand stays while its profiles still meet and is reported once they part', () => {
    let design = tableDesign();
    const leg = design.profiles.find((p) => p.direction[1] === 1 && p.start[0] < 0 && p.start[2] < 0)!;
    // A hand-made bar out to the left, its end against the leg's outer face at 500 mm.
    design = addProfile(design, { id: 'hand-bar', start: [leg.start[0] - 20 - 300, 500, leg.start[2]], direction: [1, 0, 0], length: 300, label: 'Hand bar' });
    design = addJoint(design, { id: 'hand-joint', kind: 'corner-bracket', members: [{ profileId: 'hand-bar', at: 'end' }, { profileId: leg.id, at: 'span', along: 500 }] });
    const taller = regenerateFrameGroup(design, 'fg-1', { height: 1000 });
    expect(taller.joints.some((j) => j.id === 'hand-joint')).toBe(true);
    const narrower = regenerateFrameGroup(design, 'fg-1', { width: 900 });
    expect(narrower.joints.some((j) => j.id === 'hand-joint')).toBe(false);
    expect(narrower.profiles.some((p) => p.id === 'hand-bar')).toBe(true);
    expect(narrower.frameGroups![0].unfit[0].reason).toContain('no longer meet');
  });

  it('is one serialisable operation, refuses bad sizes with the starter\'s message, and leaves its input alone', () => {
    const design = tableDesign();
    const snapshot = JSON.stringify(design);
    const op = { type: 'regenerateFrameGroup', payload: { groupId: 'fg-1', params: { width: 1500 } } } as const;
    const next = applyOperation(design, JSON.parse(JSON.stringify(op)));
    expect(next.frameGroups![0].params.width).toBe(1500);
    expect(JSON.stringify(design)).toBe(snapshot);
    expect(() => regenerateFrameGroup(design, 'fg-1', { width: 10 })).toThrow(/Width must be at least/);
  });

  it('removing every part of a group removes the group', () => {
    const design = tableDesign();
    const gone = removeParts(design, design.profiles.map((p) => p.id).concat(design.panels.map((p) => p.id), design.accessories.map((a) => a.id), design.steps.map((s) => s.id), design.loadCases.map((l) => l.id), design.subAssemblies.map((s) => s.id)));
    expect(gone.frameGroups).toEqual([]);
  });
});
