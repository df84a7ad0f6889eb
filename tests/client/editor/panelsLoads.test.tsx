// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { StructureResult } from '@/domain/analysis/types';
import type { LengthUnit } from '@/domain/units';
import { OutputsDock } from '@/features/editor/panels/OutputsDock';
import { StructureCautions } from '@/features/editor/panels/StructureCautions';
import { deflectedShape } from '@/features/editor/panels/deflectedShape';
import { createEditorStore } from '@/features/editor/store/editorStore';
import { handMadeAnalysis, historyLength, renderWithStore, shelfDesign, storeWithAnalysis } from './panelsFixtures';

afterEach(cleanup);

function loadsStore(selection: string[], units: LengthUnit = 'mm') {
  const store = storeWithAnalysis();
  store.setState({ selection, units });
  return store;
}

describe('Loads tab: the load-case form', () => {
  it('refuses a negative force with a message beside the field and adds nothing', async () => {
    const user = userEvent.setup();
    const store = loadsStore(['rail-front']);
    renderWithStore(<OutputsDock initialTab="loads" />, store);
    const force = screen.getByLabelText('Force (N)');
    await user.type(force, '-50');
    await user.click(screen.getByRole('button', { name: 'Add load case' }));
    const message = await screen.findByText(/A force cannot be negative/);
    expect(force).toHaveAttribute('aria-invalid', 'true');
    expect(force.getAttribute('aria-describedby')).toBe(message.id);
    expect(force.parentElement).toContainElement(message);
    expect(historyLength(store)).toBe(0);
    expect(store.getState().design.loadCases).toHaveLength(0);
  });

  it('adds one undoable command with a point load on the selected profile on a valid submit', async () => {
    const user = userEvent.setup();
    const store = loadsStore(['rail-front']);
    renderWithStore(<OutputsDock initialTab="loads" />, store);
    expect(screen.getByLabelText(/Position from the profile's start/)).toHaveValue('300');
    await user.type(screen.getByLabelText('Force (N)'), '400');
    await user.selectOptions(screen.getByLabelText('Beam ends'), 'fixed');
    await user.click(screen.getByRole('button', { name: 'Add load case' }));
    expect(historyLength(store)).toBe(1);
    expect(store.getState().design.loadCases).toEqual([
      {
        id: 'load-1',
        name: 'Load case 1',
        support: 'fixed',
        loads: [{ kind: 'point', profileId: 'rail-front', along: 300, force: 400, direction: [0, -1, 0] }],
      },
    ]);
    store.getState().undo();
    expect(store.getState().design.loadCases).toHaveLength(0);
  });

  it('takes pounds-force and inch positions from inch users and stores newtons and millimetres', async () => {
    const user = userEvent.setup();
    const store = loadsStore(['rail-front'], 'in');
    renderWithStore(<OutputsDock initialTab="loads" />, store);
    const position = screen.getByLabelText(/Position from the profile's start \(in\)/);
    await user.clear(position);
    await user.type(position, '10-1/2');
    await user.type(screen.getByLabelText('Force (lbf)'), '90');
    await user.click(screen.getByRole('button', { name: 'Add load case' }));
    const load = store.getState().design.loadCases[0].loads[0];
    expect(load.kind).toBe('point');
    if (load.kind !== 'point') return;
    expect(load.along).toBeCloseTo(266.7, 6); // 10.5 in x 25.4 mm/in (exact by definition)
    expect(load.force).toBeCloseTo(400.34, 2); // 90 lbf x 4.4482216152605 N/lbf (exact by definition)
  });

  it('refuses a position beyond the end of the profile', async () => {
    const user = userEvent.setup();
    const store = loadsStore(['rail-front']);
    renderWithStore(<OutputsDock initialTab="loads" />, store);
    const position = screen.getByLabelText(/Position from the profile's start/);
    await user.clear(position);
    await user.type(position, '700');
    await user.type(screen.getByLabelText('Force (N)'), '100');
    await user.click(screen.getByRole('button', { name: 'Add load case' }));
    expect(await screen.findByText(/must lie on the profile/)).toBeInTheDocument();
    expect(historyLength(store)).toBe(0);
  });

  it('spreads a load on the selected panel', async () => {
    const user = userEvent.setup();
    const store = loadsStore(['shelf']);
    renderWithStore(<OutputsDock initialTab="loads" />, store);
    expect(screen.getByLabelText('Spread on the selected panel')).toBeChecked();
    await user.type(screen.getByLabelText('Force (N), total'), '250');
    await user.click(screen.getByRole('button', { name: 'Add load case' }));
    expect(store.getState().design.loadCases[0].loads).toEqual([{ kind: 'uniform', panelId: 'shelf', totalForce: 250 }]);
  });
});

describe('Loads tab: results', () => {
  const result: StructureResult = {
    loadCaseId: 'load-1',
    loadCaseName: 'Printer on shelf',
    members: [
      {
        profileId: 'rail-front', span: 600, support: 'simple', beamCase: 'simple-point-at', load: 400, secondMoment: 90000, sectionModulus: 4500,
        maxMoment: 60000, maxDeflection: 2.1, deflectionLimit: 600 / 360, deflectionOk: false, maxStress: 13.3, allowableStress: 55, stressOk: true,
      },
    ],
    legs: [
      {
        profileId: 'leg-1', length: 400, endCondition: 'pinned-fixed-sway', effectiveLengthFactor: 2, load: 250, criticalLoad: 60000, squashLoad: 63000, chi: 0.79,
        bucklingLoad: 50000, utilisation: 0.005, bendingMoment: 0, combinedUtilisation: 0.025, ok: true,
      },
    ],
    tipOver: { pushHeight: 400, weight: 494, leverArm: 150, force: 185, edge: 'front', threshold: 0, footprint: 'profiles' },
    joints: [],
    panels: [],
    racking: { bracedX: false, bracedZ: false, sideLoadX: 0, sideLoadZ: 0 },
    problems: [],
    settings: { safetyFactor: 2, deflectionLimitRatio: 360, alloyId: '6063-T5', minYield: 110 },
    cautions: [],
  };

  function storeWithResult() {
    const design = { ...shelfDesign(), loadCases: [{ id: 'load-1', name: 'Printer on shelf', support: 'simple' as const, loads: [{ kind: 'point' as const, profileId: 'rail-front', along: 300, force: 400, direction: [0, -1, 0] as [number, number, number] }] }] };
    const store = createEditorStore({ design, units: 'mm' });
    store.getState().setAnalysisResult(design, { ...handMadeAnalysis(), structure: [result] });
    return store;
  }

  it('sketches the loaded beam with supports, the load arrow and the exaggerated deflected shape', () => {
    renderWithStore(<OutputsDock initialTab="loads" />, storeWithResult());
    const sketch = screen.getByRole('img', { name: /simply supported span of 600 mm, 400 N, deflected shape exaggerated/ });
    expect(sketch.querySelector('[data-kind="supports"]')).not.toBeNull();
    expect(within(sketch).getByText('400 N')).toBeInTheDocument();
    expect(sketch.querySelector('[data-kind="deflected-shape"]')!.getAttribute('points')!.split(' ')).toHaveLength(49);
    expect(within(sketch).getByText(/max 2.1 mm · drawn ×/)).toBeInTheDocument();
  });

  it('shows deflection against span/360 and stress against yield/2 with words, and the tip-over force', () => {
    renderWithStore(<OutputsDock initialTab="loads" />, storeWithResult());
    const table = screen.getByRole('table', { name: 'Results for Printer on shelf' });
    const deflection = within(table).getByRole('rowheader', { name: /Deflection of rail-front/ }).closest('tr')!;
    expect(deflection).toHaveTextContent('2.1 mm');
    expect(deflection).toHaveTextContent('1.67 mm (span/360)');
    expect(within(deflection).getByText('Fails')).toBeInTheDocument();
    const stress = within(table).getByRole('rowheader', { name: 'Bending stress' }).closest('tr')!;
    expect(stress).toHaveTextContent('55.0 MPa (yield/2.0)');
    expect(within(stress).getByText('Passes')).toBeInTheDocument();
    expect(within(table).getByRole('rowheader', { name: /Leg buckling/ }).closest('tr')).toHaveTextContent('0.5 %');
    expect(within(table).getByRole('rowheader', { name: /Tip-over push at 400 mm/ }).closest('tr')).toHaveTextContent('185 N');
  });

  it('keeps the cautions in view: estimates only, shear neglected, defer to supplier, codes and an engineer', () => {
    renderWithStore(<OutputsDock initialTab="loads" />, storeWithResult());
    const cautions = screen.getByRole('complementary', { name: 'Cautions' });
    expect(cautions).toHaveTextContent(/estimates/i);
    expect(cautions).toHaveTextContent(/Shear deflection is neglected/);
    expect(cautions).toHaveTextContent(/supplier's published data, local codes and a qualified engineer/);
    expect(cautions).toHaveTextContent(/Limits in force: deflection span\/360 and stress below yield divided by 2.0/);
    expect(cautions).toHaveTextContent(/Not checked: local buckling/);
  });

  it('shows the limits actually in force after the settings change', () => {
    render(<StructureCautions settings={{ safetyFactor: 3, deflectionLimitRatio: 240 }} />);
    const cautions = screen.getByRole('complementary', { name: 'Cautions' });
    expect(cautions).toHaveTextContent(/span\/240 and stress below yield divided by 3.0/);
    expect(cautions).not.toHaveTextContent(/span\/360/);
  });
});

describe('Deflected shape for the sketch', () => {
  // Shapes from the textbook elastic curves (American Wood Council, Design Aid 6).
  it('peaks at mid-span for a centre load and is zero at the supports', () => {
    const shape = deflectedShape(1000, 'simple', { kind: 'point', at: 500 }, 10);
    expect(shape[0][1]).toBe(0);
    expect(shape[10][1]).toBeCloseTo(0, 12);
    expect(shape[5][1]).toBeCloseTo(1, 12);
  });

  it('draws a fixed-end beam flatter near its supports than a simple one (quarter-point ratio 0.5 against 0.6875)', () => {
    // Fixed-fixed, centre load: y(x) ∝ x²(3L − 4x); at L/4: (L²/16)(2L) = L³/8; at L/2: (L²/4)(L) = L³/4 → ratio 0.5.
    const fixed = deflectedShape(1000, 'fixed', { kind: 'point', at: 500 }, 4);
    expect(fixed[1][1]).toBeCloseTo(0.5, 12);
    // Simple, centre load: y(x) ∝ x(3L² − 4x²); at L/4: (L/4)(2.75L²) = 0.6875L³; at L/2: 0.5L³ → ratio 0.6875.
    const simple = deflectedShape(1000, 'simple', { kind: 'point', at: 500 }, 4);
    expect(simple[1][1]).toBeCloseTo(0.6875, 12);
  });
});
