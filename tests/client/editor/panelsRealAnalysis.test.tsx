// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { applyOperation } from '@/domain/design/operations';
import type { DesignDocument } from '@/domain/design/schema';
import { FindingsPanel } from '@/features/editor/panels/FindingsPanel';
import { OutputsDock } from '@/features/editor/panels/OutputsDock';
import { createEditorStore } from '@/features/editor/store/editorStore';
import { historyLength, renderWithStore, shelfDesign } from './panelsFixtures';

afterEach(cleanup);

/** The shelf fixture with the front rail bracketed onto both legs and a 400 N load at its middle. */
function bracketedShelf(): DesignDocument {
  let design = shelfDesign();
  design = applyOperation(design, { type: 'addJoint', payload: { joint: { kind: 'corner-bracket', members: [{ profileId: 'leg-1', at: 'end' }, { profileId: 'rail-front', at: 'start' }] } } });
  design = applyOperation(design, { type: 'addJoint', payload: { joint: { kind: 'corner-bracket', members: [{ profileId: 'leg-2', at: 'end' }, { profileId: 'rail-front', at: 'end' }] } } });
  return {
    ...design,
    loadCases: [{ id: 'load-1', name: 'Box on the rail', support: 'simple', loads: [{ kind: 'point', profileId: 'rail-front', along: 300, force: 400, direction: [0, -1, 0] }] }],
  };
}

function analysedStore() {
  const design = bracketedShelf();
  const store = createEditorStore({ design, units: 'mm' });
  store.getState().setAnalysisResult(design, analyzeDesign(design));
  return store;
}

describe('Outputs against a real analysis of a small design', () => {
  it('lists the profile metres and pieces in the parts table', () => {
    renderWithStore(<OutputsDock />, analysedStore());
    const table = screen.getByRole('table', { name: 'Bill of materials' });
    const profileLine = within(table).getAllByText(/profile 40 x 40 mm/i)[0].closest('tr')!;
    expect(profileLine).toHaveTextContent('2.000 m'); // 2 x 600 + 2 x 400 mm
    expect(profileLine).toHaveTextContent('4 pieces');
  });

  it('draws the analysed stock plan: as many bars as planned and one cut per profile', async () => {
    const user = userEvent.setup();
    const store = analysedStore();
    renderWithStore(<OutputsDock />, store);
    await user.click(screen.getByRole('tab', { name: 'Bars' }));
    const plan = store.getState().analysis!.stockPlans[0].plan;
    const picture = screen.getByRole('img', { name: /Stock plan for m40-40x40/ });
    expect(picture.querySelectorAll('[data-kind="bar"]')).toHaveLength(plan.bars.length);
    expect(picture.querySelectorAll('[data-kind="cut"]')).toHaveLength(4);
  });

  it('names the hex key for the bracket screws with its standard', () => {
    renderWithStore(<OutputsDock initialTab="tools" />, analysedStore());
    // M8 button head screw takes a 5 mm key: ISO 7380-1 (check-values.md, verified).
    const hexRow = screen.getByRole('table', { name: 'Hex keys' }).querySelector('tbody tr')!;
    expect(hexRow).toHaveTextContent('5 mm');
    expect(hexRow).toHaveTextContent('ISO 7380-1');
  });

  it('shows the load case estimate for the loaded rail against span/360', () => {
    renderWithStore(<OutputsDock initialTab="loads" />, analysedStore());
    const table = screen.getByRole('table', { name: 'Results for Box on the rail' });
    const deflection = within(table).getByRole('rowheader', { name: /Deflection of rail-front/ }).closest('tr')!;
    expect(deflection).toHaveTextContent('1.67 mm (span/360)'); // 600 mm / 360
    expect(within(deflection).getByText(/Passes|Fails/)).toBeInTheDocument();
  });

  it('fixes a missing end cap from the findings list as one undoable edit', async () => {
    const user = userEvent.setup();
    const store = analysedStore();
    renderWithStore(<FindingsPanel />, store);
    const fixButtons = screen.getAllByRole('button', { name: /^Fix: / });
    expect(fixButtons.length).toBeGreaterThan(0);
    const capsBefore = store.getState().design.accessories.filter((accessory) => accessory.kind === 'end-cap').length;
    await user.click(fixButtons[0]);
    expect(historyLength(store)).toBe(1);
    expect(store.getState().design.accessories.filter((accessory) => accessory.kind === 'end-cap').length).toBe(capsBefore + 1);
  });
});
