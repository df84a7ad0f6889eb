// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { act, cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { buildPrinterEnclosure } from '@/domain/fixtures/demoDesigns';
import { SequencePanel } from '@/features/editor/sequence/SequencePanel';
import { historyLength, renderWithStore, storeWithAnalysis } from './panelsFixtures';

afterEach(cleanup);

const titles = () => within(screen.getByRole('list', { name: 'Assembly steps' })).getAllByTestId('sequence-step').map((li) => li.querySelector('span.truncate')?.textContent);

describe('Sequence panel', () => {
  it('moves a step with its down button as one undoable command and shows the finding for the infeasible order', async () => {
    const user = userEvent.setup();
    const design = buildPrinterEnclosure();
    const store = storeWithAnalysis(design, analyzeDesign(design));
    renderWithStore(<SequencePanel />, store);
    expect(titles().slice(2, 4)).toEqual(['Slide in the bottom shelf', 'Bottom rail: front']);
    await user.click(screen.getByRole('button', { name: 'Move step 3 down' }));
    expect(titles().slice(2, 4)).toEqual(['Bottom rail: front', 'Slide in the bottom shelf']);
    expect(historyLength(store)).toBe(1);
    expect(store.getState().design.sequenceEdited).toBe(true);
    // The panel shows the check's finding once the analysis of the new order is in.
    const next = store.getState().design;
    act(() => store.getState().setAnalysisResult(next, analyzeDesign(next)));
    expect(await screen.findByTestId('sequence-finding')).toHaveTextContent('Move step 4 before step 3.');
    act(() => store.getState().undo());
    expect(titles().slice(2, 4)).toEqual(['Slide in the bottom shelf', 'Bottom rail: front']);
  });

  it('asks before regenerating an edited order, and keeps the edits when told to', async () => {
    const user = userEvent.setup();
    const design = { ...buildPrinterEnclosure(), sequenceEdited: true };
    design.steps = design.steps.map((s, i) => (i === 0 ? { ...s, title: 'My own first step' } : s));
    const store = storeWithAnalysis(design, analyzeDesign(design));
    renderWithStore(<SequencePanel />, store);
    await user.click(screen.getByRole('button', { name: /Regenerate/ }));
    const dialog = screen.getByRole('alertdialog', { name: 'Regenerate the sequence' });
    await user.click(within(dialog).getByRole('button', { name: 'Keep my edits' }));
    expect(titles()[0]).toBe('My own first step');
    await user.click(screen.getByRole('button', { name: /Regenerate/ }));
    await user.click(screen.getByRole('button', { name: 'Replace my edits' }));
    expect(titles()[0]).toBe('Stand the 4 uprights');
    expect(store.getState().design.sequenceEdited).toBe(false);
  });

  it('merges checked steps and edits a caution', async () => {
    const user = userEvent.setup();
    const design = buildPrinterEnclosure();
    const store = storeWithAnalysis(design, analyzeDesign(design));
    renderWithStore(<SequencePanel />, store);
    const count = titles().length;
    await user.click(screen.getByRole('checkbox', { name: 'Check step 1' }));
    await user.click(screen.getByRole('checkbox', { name: 'Check step 2' }));
    await user.click(screen.getByRole('button', { name: 'Merge checked steps' }));
    expect(titles()).toHaveLength(count - 1);
    await user.click(screen.getByRole('button', { name: /^1\.\s*Stand the 4 uprights$/ }));
    const caution = screen.getByLabelText('Caution');
    await user.type(caution, 'Two people');
    await user.tab();
    expect(store.getState().design.steps[0].caution).toBe('Two people');
    expect(historyLength(store)).toBe(2);
  });
});
