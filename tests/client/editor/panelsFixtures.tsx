import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import type { DesignAnalysis } from '@/domain/analysis/types';
import { designDocumentSchema, type DesignDocument, CURRENT_SCHEMA_VERSION } from '@/domain/design/schema';
import { createEditorStore, EditorStoreProvider, type EditorStoreApi } from '@/features/editor/store/editorStore';

/** A small table frame: four 600 mm rails and a shelf panel, metric 40. */
export function shelfDesign(): DesignDocument {
  return designDocumentSchema.parse({
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: 'Bench shelf, test',
    systemId: 'metric-40',
    settings: { stockLength: 1000, kerf: 4, endTrim: 10, minReusableOffcut: 150 },
    profiles: [
      { id: 'rail-front', variantId: 'm40-40x40', length: 600, start: [0, 400, 0], direction: [1, 0, 0], label: 'Front rail' },
      { id: 'rail-back', variantId: 'm40-40x40', length: 600, start: [0, 400, 400], direction: [1, 0, 0], label: 'Back rail' },
      { id: 'leg-1', variantId: 'm40-40x40', length: 400, start: [0, 0, 0], direction: [0, 1, 0], label: 'Leg 1' },
      { id: 'leg-2', variantId: 'm40-40x40', length: 400, start: [600, 0, 0], direction: [0, 1, 0], label: 'Leg 2' },
    ],
    panels: [
      {
        id: 'shelf',
        materialId: 'plywood',
        thickness: 12,
        mounting: 'face',
        rect: { center: [300, 420, 200], normal: 'y', width: 600, height: 400 },
      },
    ],
  });
}

/** A hand-made analysis with round numbers, so tests can assert exact figures. */
export function handMadeAnalysis(): DesignAnalysis {
  const end = { kind: 'plain' as const, description: 'Plain' };
  return {
    findings: [
      {
        id: 'joints:leg-1:start',
        check: 'joints',
        severity: 'error',
        partIds: ['leg-1'],
        message: 'The start of Leg 1 is not joined and has no end cap.',
        fix: { label: 'Add end caps to free ends', operation: { type: 'autoEndCaps' } },
      },
      { id: 'panel-fit:shelf', check: 'panel-fit', severity: 'warning', partIds: ['shelf', 'rail-front'], message: 'The shelf overhangs the front rail by 2 mm.' },
      { id: 'sequence:note', check: 'sequence', severity: 'note', partIds: ['rail-back'], message: 'Slide the T-nuts into the back rail before closing it.' },
    ],
    counts: { error: 1, warning: 1, note: 1 },
    bom: [
      { code: 'm40-40x40', description: 'Profile 40 x 40 mm', category: 'profile', quantity: 2, unit: 'm', unitMass: 1.5, unitPrice: 12, linePrice: 24, lineMass: 3, pieces: 4, partIds: ['rail-front', 'rail-back', 'leg-1', 'leg-2'] },
      { code: 'BR-40', description: 'Inside corner bracket, 40', category: 'connector', quantity: 8, unit: 'pcs', unitMass: 0.05, unitPrice: 1.25, linePrice: 10, lineMass: 0.4, partIds: [] },
      { code: 'SC-M8x16', description: 'Button head screw M8 x 16', category: 'fastener', quantity: 16, unit: 'pcs', unitMass: 0.01, unitPrice: 0.2, linePrice: 3.2, lineMass: 0.16, partIds: [] },
      { code: 'TN-M8', description: 'Drop-in T-nut M8', category: 't-nut', quantity: 3, unit: 'pcs', unitMass: 0.008, unitPrice: 0.5, linePrice: 1.5, lineMass: 0.024, partIds: [] },
      { code: 'EC-40', description: 'End cap 40', category: 'accessory', quantity: 5, unit: 'pcs', unitMass: 0.01, unitPrice: 0.4, linePrice: 2, lineMass: 0.05, partIds: [] },
    ],
    cutList: [
      { id: 'rail-front', label: 'Front rail', variantId: 'm40-40x40', length: 600, tolerance: 0.5, ends: { start: end, end: { kind: 'tap', thread: 'M8 x 1.25', description: 'Tap' } }, machining: [{ id: 'm1', kind: 'access-counterbore', fromEnd: 'start', offset: 20, face: 0, diameter: 7.5, description: 'Access counterbore' }], groupKey: 'g600' },
      { id: 'rail-back', label: 'Back rail', variantId: 'm40-40x40', length: 600, tolerance: 0.5, ends: { start: end, end: { kind: 'tap', thread: 'M8 x 1.25', description: 'Tap' } }, machining: [{ id: 'm2', kind: 'access-counterbore', fromEnd: 'start', offset: 20, face: 0, diameter: 7.5, description: 'Access counterbore' }], groupKey: 'g600' },
      { id: 'leg-1', label: 'Leg 1', variantId: 'm40-40x40', length: 400, tolerance: 0.5, ends: { start: end, end }, machining: [], groupKey: 'g400' },
      { id: 'leg-2', label: 'Leg 2', variantId: 'm40-40x40', length: 400, tolerance: 0.5, ends: { start: end, end }, machining: [], groupKey: 'g400' },
    ],
    cutGroups: [
      { groupKey: 'g600', variantId: 'm40-40x40', length: 600, tolerance: 0.5, quantity: 2, profileIds: ['rail-front', 'rail-back'], ends: { start: end, end: { kind: 'tap', thread: 'M8 x 1.25', description: 'Tap' } }, machining: [{ id: 'm1', kind: 'access-counterbore', fromEnd: 'start', offset: 20, face: 0, diameter: 7.5, description: 'Access counterbore' }] },
      { groupKey: 'g400', variantId: 'm40-40x40', length: 400, tolerance: 0.5, quantity: 2, profileIds: ['leg-1', 'leg-2'], ends: { start: end, end }, machining: [] },
    ],
    stockPlans: [
      {
        variantId: 'm40-40x40',
        plan: {
          // usable 990 mm; 600 + 4 + 380 offcut... hand-built to match stockPlan.ts's model
          bars: [
            { index: 0, cuts: [{ id: 'rail-front', length: 600, label: 'Front rail' }], usedLength: 604, offcut: 386, reusable: true },
            { index: 1, cuts: [{ id: 'rail-back', length: 600, label: 'Back rail' }], usedLength: 604, offcut: 386, reusable: true },
            { index: 2, cuts: [{ id: 'leg-1', length: 400, label: 'Leg 1' }, { id: 'leg-2', length: 400, label: 'Leg 2' }], usedLength: 808, offcut: 182, reusable: true },
          ],
          barCount: 3,
          lowerBound: 3,
          firstFitDecreasingBarCount: 3,
          totalCutLength: 2000,
          wasteLength: 46,
          method: 'first-fit decreasing',
          unplaceable: [],
        },
      },
    ],
    panelCuts: [],
    tools: [
      { id: 'hex-5', kind: 'hex-key', name: 'Hex key', size: '5 mm', standard: 'ISO 7380-1', reason: 'M8 button head screws' },
      { id: 'drill-7.5', kind: 'drill', name: 'Drill bit', size: '7.5 mm', reason: 'Access counterbores' },
    ],
    mass: { total: 9.63, byCategory: { profile: 3, panel: 6, connector: 0.4, fastener: 0.16, 't-nut': 0.024, accessory: 0.05 }, centreOfMass: [300, 330, 150], overallSize: { x: 640, y: 432, z: 440 }, boundingBox: { min: [-20, 0, -20], max: [620, 432, 420] } },
    cost: {
      lines: [
        { code: 'm40-40x40', description: 'Profile 40 x 40 mm', category: 'profile', quantity: 2, unit: 'm', unitPrice: 12, linePrice: 24 },
        { code: 'CUT', description: 'Saw cuts', category: 'cutting', quantity: 4, unit: 'pcs', unitPrice: 1.5, linePrice: 6 },
        { code: 'BR-40', description: 'Inside corner bracket, 40', category: 'connector', quantity: 8, unit: 'pcs', unitPrice: 1.25, linePrice: 10 },
      ],
      subtotalByCategory: { profile: 24, cutting: 6, connector: 10 },
      total: 40,
      currency: 'USD',
      note: 'demo prices',
    },
    structure: [],
    stability: { empty: null, worst: null },
  };
}

export function renderWithStore(ui: ReactNode, store: EditorStoreApi) {
  return render(<EditorStoreProvider store={store}>{ui}</EditorStoreProvider>);
}

/** A store holding the shelf design with an analysis already in place. */
export function storeWithAnalysis(design = shelfDesign(), analysis = handMadeAnalysis()): EditorStoreApi {
  const store = createEditorStore({ design, units: 'mm' });
  store.getState().setAnalysisResult(design, analysis);
  return store;
}

export function historyLength(store: EditorStoreApi): number {
  return store.temporal.getState().pastStates.length;
}
