// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { FindingsPanel } from '@/features/editor/panels/FindingsPanel';
import { handMadeAnalysis, historyLength, renderWithStore, shelfDesign, storeWithAnalysis } from './panelsFixtures';

afterEach(cleanup);

describe('Findings panel', () => {
  it('groups findings by severity, each with a word and not colour alone, and counts them in the header', () => {
    renderWithStore(<FindingsPanel />, storeWithAnalysis());
    expect(screen.getByText('1 error · 1 warning · 1 note')).toBeInTheDocument();
    const errors = screen.getByRole('region', { name: 'Errors (1)' });
    const warnings = screen.getByRole('region', { name: 'Warnings (1)' });
    const notes = screen.getByRole('region', { name: 'Notes (1)' });
    expect(within(errors).getByRole('button', { name: /Error: The start of Leg 1/ })).toBeInTheDocument();
    expect(within(warnings).getByRole('button', { name: /Warning: The shelf overhangs/ })).toBeInTheDocument();
    expect(within(notes).getByRole('button', { name: /Note: Slide the T-nuts/ })).toBeInTheDocument();
    // Order: errors before warnings before notes.
    expect(errors.compareDocumentPosition(warnings) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(warnings.compareDocumentPosition(notes) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
  });

  it('selects and frames the parts of a finding when it is clicked', async () => {
    const user = userEvent.setup();
    const store = storeWithAnalysis();
    renderWithStore(<FindingsPanel />, store);
    await user.click(screen.getByRole('button', { name: /Warning: The shelf overhangs/ }));
    expect(store.getState().selection).toEqual(['shelf', 'rail-front']);
    expect(store.getState().frameRequest?.ids).toEqual(['shelf', 'rail-front']);
    expect(screen.getByRole('button', { name: /Warning: The shelf overhangs/ })).toHaveAttribute('aria-current', 'true');
  });

  it('highlights the main part of a finding while the pointer is over it', async () => {
    const user = userEvent.setup();
    const store = storeWithAnalysis();
    renderWithStore(<FindingsPanel />, store);
    await user.hover(screen.getByRole('button', { name: /Note: Slide the T-nuts/ }));
    expect(store.getState().hoveredId).toBe('rail-back');
    await user.unhover(screen.getByRole('button', { name: /Note: Slide the T-nuts/ }));
    expect(store.getState().hoveredId).toBeNull();
  });

  it('applies a finding\'s fix as one undoable command', async () => {
    const user = userEvent.setup();
    const store = storeWithAnalysis();
    renderWithStore(<FindingsPanel />, store);
    const before = store.getState().design;
    await user.click(screen.getByRole('button', { name: 'Fix: Add end caps to free ends' }));
    expect(historyLength(store)).toBe(1);
    expect(store.getState().design).not.toBe(before);
    expect(store.getState().design.accessories.some((accessory) => accessory.kind === 'end-cap')).toBe(true);
    store.getState().undo();
    expect(store.getState().design).toEqual(before);
  });

  it('says all clear when there are no findings', () => {
    renderWithStore(<FindingsPanel />, storeWithAnalysis(shelfDesign(), { ...handMadeAnalysis(), findings: [], counts: { error: 0, warning: 0, note: 0 } }));
    expect(screen.getByText('All clear.')).toBeInTheDocument();
    expect(screen.getByText('0 errors · 0 warnings · 0 notes')).toBeInTheDocument();
  });
});
