import { describe, expect, it } from 'vitest';
import { analyzeDesign, createAnalysisContext } from '@/domain/analysis/analyze';
import { applyOperation } from '@/domain/design/operations';
import type { DesignDocument } from '@/domain/design/schema';
import { jointFindings } from '@/domain/checks/jointFindings';
import { panelFitFindings } from '@/domain/checks/panelFitFindings';
import { interferenceFindings, interferenceFindingsAllPairs } from '@/domain/checks/interferenceFindings';
import { sequenceFindings } from '@/domain/assembly/sequenceFindings';
import { defaultCatalogue } from '@/domain/catalogue';
import { boxFrame, withProfileChange } from './checksDesigns';

const metric40 = defaultCatalogue.systems.find((s) => s.id === 'metric-40')!;

const findingsOf = (design: DesignDocument) => analyzeDesign(design).findings;
const withReason = (design: DesignDocument, reason: string) => findingsOf(design).filter((f) => f.id.split(':')[1] === reason);

describe('a correct box frame', () => {
  it('has no errors or warnings, only notes', () => {
    const analysis = analyzeDesign(boxFrame({ backPanel: true }));
    expect(analysis.counts.error).toBe(0);
    expect(analysis.counts.warning).toBe(0);
    expect(analysis.findings.every((f) => f.severity === 'note')).toBe(true);
  });

  it('stays silent with concealed connectors and their counterbores', () => {
    const analysis = analyzeDesign(boxFrame({ jointKind: 'concealed-connector' }));
    expect(analysis.findings.filter((f) => f.severity !== 'note')).toEqual([]);
  });
});

describe('joint check', () => {
  it('reports an end that is neither joined nor capped, with a fix that adds an end cap', () => {
    const design = boxFrame();
    design.accessories = design.accessories.filter((a) => a.id !== 'L1-cap');
    const open = withReason(design, 'open-end');
    expect(open).toHaveLength(1);
    expect(open[0].message).toBe('The top end of the 900 mm profile standing upright is not joined to anything and has no end cap.');
    expect(open[0].fix?.operation.type).toBe('addAccessory');
    const fixed = applyOperation(design, open[0].fix!.operation);
    expect(withReason(fixed, 'open-end')).toHaveLength(0);
  });

  it('reports a profile end resting on another profile without a joint as an error', () => {
    const design = boxFrame();
    design.joints = design.joints.filter((j) => j.id !== 'J-RXF-low-s');
    const touching = withReason(design, 'touching-unjoined');
    expect(touching).toHaveLength(1);
    expect(touching[0].severity).toBe('error');
    expect(touching[0].partIds).toEqual(['RXF-low', 'L1']);
  });

  it('reports a missing counterbore for a concealed connector and fixes it by re-applying the connector', () => {
    const design = withProfileChange(boxFrame({ jointKind: 'concealed-connector' }), 'RXF-top', (p) => ({
      ...p,
      machining: p.machining.filter((m) => m.fromEnd !== 'end'),
    }));
    const missing = withReason(design, 'missing-access-counterbore');
    expect(missing).toHaveLength(1);
    expect(missing[0].severity).toBe('error');
    expect(missing[0].partIds).toEqual(['RXF-top', 'J-RXF-top-e']);
    expect(missing[0].message).toContain('access counterbore');
    const fixed = applyOperation(design, missing[0].fix!.operation);
    expect(withReason(fixed, 'missing-access-counterbore')).toHaveLength(0);
  });

  it('reports a connector made for another system', () => {
    const design = boxFrame();
    design.joints = design.joints.map((j) => (j.id === 'J-RZL-top-e' ? { ...j, connectorId: 'm20-corner-bracket' } : j));
    const mismatch = withReason(design, 'system-mismatch');
    expect(mismatch.length).toBeGreaterThanOrEqual(1);
    expect(mismatch.every((f) => f.severity === 'error' && f.partIds[0] === 'J-RZL-top-e')).toBe(true);
  });

  it('reports a joint whose profiles do not meet', () => {
    const design = withProfileChange(boxFrame(), 'RZR-low', (p) => ({ ...p, start: [p.start[0], p.start[1], p.start[2] + 30] }));
    const apart = withReason(design, 'members-apart');
    expect(apart.map((f) => f.partIds[0])).toContain('J-RZR-low-s');
  });

  it('reports a foot screwed into an end that is not tapped', () => {
    const design = withProfileChange(boxFrame(), 'L2', (p) => ({ ...p, machining: [] }));
    const untapped = withReason(design, 'untapped-foot');
    expect(untapped).toHaveLength(1);
    expect(untapped[0].partIds).toEqual(['L2', 'L2-foot']);
  });

  it('reports two concealed connectors that claim the same slot position', () => {
    const design = boxFrame({ jointKind: 'concealed-connector' });
    // A second rail meets leg L1's face 5 mm above the low rail: both connectors need that slot.
    design.profiles.push({ ...design.profiles.find((p) => p.id === 'RXF-low')!, id: 'EXTRA', start: [40, 105, 20] });
    design.joints.push({ ...design.joints.find((j) => j.id === 'J-RXF-low-s')!, id: 'J-EXTRA', members: [{ profileId: 'EXTRA', at: 'start' }, { profileId: 'L1', at: 'span', along: 105 }] });
    const ctx = createAnalysisContext(design);
    const claims = jointFindings(ctx).filter((f) => f.id.includes('slot-claimed-twice'));
    expect(claims).toHaveLength(1);
    expect(claims[0].partIds).toEqual(['L1', 'J-EXTRA', 'J-RXF-low-s']);
    expect(claims[0].severity).toBe('error');
  });

  it('reports an access counterbore covered by another profile', () => {
    const design = boxFrame({ jointKind: 'concealed-connector' });
    const rail = design.profiles.find((p) => p.id === 'RXF-low')!;
    // Face 1 of a rail along +X is its underside (local y = X × Z = −Y): put a block under it.
    design.profiles.push({ ...rail, id: 'BLOCK', length: 60, start: [40, 60, 20], machining: [] });
    const ctx = createAnalysisContext(design);
    const covered = jointFindings(ctx).filter((f) => f.id.includes('access-covered'));
    expect(covered.map((f) => f.partIds)).toEqual([['RXF-low', 'BLOCK']]);
  });
});

describe('panel fit check', () => {
  it('rejects a panel too thick for the slot opening with its clearance, with the numbers, and offers a sheet that fits', () => {
    const design = boxFrame({ backPanel: true, panelThickness: 10 });
    const thick = panelFitFindings(createAnalysisContext(design)).filter((f) => f.id.includes('too-thick'));
    expect(thick).toHaveLength(1);
    expect(thick[0].severity).toBe('error');
    expect(thick[0].message).toMatch(/^10 mm acrylic \(pmma\), clear is thicker than the 8 mm slot opening/);
    expect(thick[0].data).toMatchObject({ thicknessMm: 10, slotOpeningMm: 8 });
    // 8 mm cast acrylic may be 9.2 mm (ISO 7823-1, check-values): the fix offers 6 mm, which is at most 7 mm.
    expect(thick[0].fix?.operation).toEqual({ type: 'updatePanel', payload: { panelId: 'BACK', changes: { thickness: 6 } } });
    const fixed = applyOperation(design, thick[0].fix!.operation);
    expect(panelFitFindings(createAnalysisContext(fixed)).filter((f) => f.severity !== 'note')).toEqual([]);
  });

  it('asks for a gasket on a much thinner panel and computes its length from the sheet edges', () => {
    const design = boxFrame({ backPanel: true, panelThickness: 3 });
    const thin = panelFitFindings(createAnalysisContext(design)).filter((f) => f.id.includes('too-thin'));
    expect(thin).toHaveLength(1);
    expect(thin[0].severity).toBe('warning');
    // Opening 720 x 740 mm; sheet = opening + 2 x engagement - 1 mm clearance on each side.
    const e = metric40.slotEngagement;
    expect(thin[0].data?.gasketLengthMm).toBe(Math.round(2 * (720 + 2 * e - 1 + 740 + 2 * e - 1)));
    const fixed = applyOperation(design, thin[0].fix!.operation);
    expect(panelFitFindings(createAnalysisContext(fixed)).filter((f) => f.id.includes('too-thin'))).toEqual([]);
  });

  it('sizes a captured panel as the opening plus twice the engagement minus the clearance', () => {
    const analysis = analyzeDesign(boxFrame({ backPanel: true }));
    const engagement = metric40.slotEngagement;
    expect(analysis.panelCuts[0]).toMatchObject({ panelId: 'BACK', width: 720 + 2 * engagement - 1, height: 740 + 2 * engagement - 1 });
  });

  it('notes the corner notches where brackets sit in the panel slot', () => {
    const notch = panelFitFindings(createAnalysisContext(boxFrame({ backPanel: true }))).find((f) => f.id.includes('corner-notch'));
    expect(notch?.severity).toBe('note');
    expect(notch?.data).toMatchObject({ corners: 4, notchMm: 36 });
  });

  it('warns when the drawn panel does not match its frame opening', () => {
    const design = boxFrame({ backPanel: true });
    design.panels[0] = { ...design.panels[0], rect: { ...design.panels[0].rect, width: 700 } };
    expect(withReason(design, 'opening-mismatch')).toHaveLength(1);
  });
});

describe('interference check', () => {
  it('reports two overlapping profiles with the overlap depth', () => {
    const design = boxFrame();
    design.profiles.push({ ...design.profiles.find((p) => p.id === 'RXF-low')!, id: 'STRAY', start: [40, 130, 20] });
    const ctx = createAnalysisContext(design);
    const found = interferenceFindings(ctx);
    expect(found).toHaveLength(1);
    expect(found[0].partIds).toEqual(['RXF-low', 'STRAY']);
    expect(found[0].data?.overlapMm).toBe(10);
    expect(interferenceFindingsAllPairs(ctx)).toEqual(found);
  });

  it('treats parts within the 0.2 mm tolerance and joined parts as contacts', () => {
    const design = boxFrame({ backPanel: true });
    design.profiles.push({ ...design.profiles.find((p) => p.id === 'RXF-low')!, id: 'NEAR', start: [40, 139.85, 20] });
    expect(interferenceFindings(createAnalysisContext(design))).toEqual([]);
  });
});

describe('sequence check', () => {
  it('reports slide-in T-nuts placed after both ends of their profile are closed', () => {
    const design = boxFrame();
    design.joints = design.joints.map((j) => (j.id === 'J-RXF-low-s' ? { ...j, tNut: 'slide-in' } : j));
    const rest = [...design.profiles.map((p) => p.id), ...design.accessories.map((a) => a.id)];
    design.steps = [
      { id: 's1', title: 'Legs, rails, feet and caps', partIds: rest, kind: 'place' },
      { id: 's2', title: 'Joints', partIds: design.joints.map((j) => j.id), kind: 'place' },
    ];
    const seq = sequenceFindings(createAnalysisContext(design));
    expect(seq.map((f) => f.id)).toEqual(['sequence:slide-in-closed:J-RXF-low-s+L1']);
    expect(seq[0].message).toContain('use drop-in T-nuts');
  });

  it('reports a captured panel placed after its frame is closed, and not when placed before', () => {
    const design = boxFrame({ backPanel: true });
    const frame = [...design.profiles.map((p) => p.id), ...design.joints.map((j) => j.id)];
    design.steps = [
      { id: 's1', title: 'Frame', partIds: frame, kind: 'place' },
      { id: 's2', title: 'Back panel', partIds: ['BACK'], kind: 'place' },
    ];
    expect(sequenceFindings(createAnalysisContext(design)).filter((f) => f.severity === 'error').map((f) => f.id)).toEqual(['sequence:panel-after-frame:BACK']);
    design.steps = [
      { id: 's1', title: 'Frame without the top back rail', partIds: frame.filter((id) => !id.startsWith('J-RXB-top')), kind: 'place' },
      { id: 's2', title: 'Back panel', partIds: ['BACK'], kind: 'place' },
      { id: 's3', title: 'Close the frame', partIds: ['J-RXB-top-s', 'J-RXB-top-e'], kind: 'place' },
    ];
    expect(sequenceFindings(createAnalysisContext(design)).filter((f) => f.severity === 'error')).toEqual([]);
  });

  it('reports a step that names a part the design does not have', () => {
    const design = boxFrame();
    design.steps = [{ id: 's1', title: 'Ghost', partIds: ['NOPE'], kind: 'place' }];
    const seq = sequenceFindings(createAnalysisContext(design)).filter((f) => f.severity === 'error');
    expect(seq).toHaveLength(1);
    expect(seq[0].severity).toBe('error');
    expect(seq[0].partIds).toEqual(['s1', 'NOPE']);
  });
});
