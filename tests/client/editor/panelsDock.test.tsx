// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { act, cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { OutputsDock } from '@/features/editor/panels/OutputsDock';
import { createEditorStore } from '@/features/editor/store/editorStore';
import { designDocumentSchema, CURRENT_SCHEMA_VERSION } from '@/domain/design/schema';
import { renderWithStore, storeWithAnalysis } from './panelsFixtures';

afterEach(cleanup);

describe('Outputs dock', () => {
  it('moves between tabs with the arrow keys, keeping only the active tab in the tab order', async () => {
    const user = userEvent.setup();
    renderWithStore(<OutputsDock />, storeWithAnalysis());
    const tabs = screen.getAllByRole('tab');
    expect(tabs.map((tab) => tab.textContent)).toEqual(['Parts', 'Cuts', 'Bars', 'Tools', 'Weight', 'Price', 'Loads', 'Sequence']);
    expect(tabs[0]).toHaveAttribute('aria-selected', 'true');
    expect(tabs.filter((tab) => tab.tabIndex === 0)).toEqual([tabs[0]]);
    tabs[0].focus();
    await user.keyboard('{ArrowRight}');
    expect(screen.getByRole('tab', { name: 'Cuts' })).toHaveAttribute('aria-selected', 'true');
    expect(screen.getByRole('tab', { name: 'Cuts' })).toHaveFocus();
    expect(screen.getByRole('tabpanel')).toHaveAttribute('aria-labelledby', screen.getByRole('tab', { name: 'Cuts' }).id);
    expect(screen.getByRole('table', { name: 'Cut list' })).toBeInTheDocument();
    await user.keyboard('{End}');
    expect(screen.getByRole('tab', { name: 'Sequence' })).toHaveFocus();
    await user.keyboard('{ArrowRight}');
    expect(screen.getByRole('tab', { name: 'Parts' })).toHaveAttribute('aria-selected', 'true');
  });

  it('collapses and expands', async () => {
    const user = userEvent.setup();
    renderWithStore(<OutputsDock />, storeWithAnalysis());
    const toggle = screen.getByRole('button', { name: /Outputs/ });
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    expect(screen.queryByRole('tabpanel')).toBeNull();
    await user.click(toggle);
    expect(screen.getByRole('tabpanel')).toBeInTheDocument();
  });

  it('keeps the previous numbers visible, dimmed, while a new analysis runs', () => {
    const store = storeWithAnalysis();
    renderWithStore(<OutputsDock />, store);
    act(() => store.getState().setAnalysisRunning());
    const panel = screen.getByRole('tabpanel');
    expect(panel).toHaveAttribute('aria-busy', 'true');
    expect(panel.className).toContain('opacity-60');
    expect(within(panel).getByText('Inside corner bracket, 40')).toBeInTheDocument();
    expect(screen.getByRole('status')).toHaveTextContent('Updating…');
  });

  it('shows an empty state for an empty design', () => {
    const design = designDocumentSchema.parse({ schemaVersion: CURRENT_SCHEMA_VERSION, name: 'Blank', systemId: 'metric-40' });
    renderWithStore(<OutputsDock />, createEditorStore({ design }));
    expect(screen.getByText('Nothing to list yet.')).toBeInTheDocument();
  });

  it('lists tools with their size and standard, weight with the centre of mass, and demo prices', async () => {
    const user = userEvent.setup();
    renderWithStore(<OutputsDock initialTab="tools" />, storeWithAnalysis());
    const hexRow = screen.getByText('Hex key').closest('tr')!;
    expect(hexRow).toHaveTextContent('5 mm');
    expect(hexRow).toHaveTextContent('ISO 7380-1');

    await user.click(screen.getByRole('tab', { name: 'Weight' }));
    expect(screen.getByRole('table', { name: 'Mass by category' })).toHaveTextContent('9.63 kg');
    expect(screen.getByText('Width (X)').nextElementSibling).toHaveTextContent('640 mm');
    // Centre of mass 300 mm in X measured from the bounding box's lowest corner at −20 mm.
    expect(screen.getByText('X').nextElementSibling).toHaveTextContent('320 mm');
    expect(document.querySelector('[data-kind="centre-of-mass"]')).not.toBeNull();

    await user.click(screen.getByRole('tab', { name: 'Price' }));
    expect(screen.getByRole('note')).toHaveTextContent(/Demo prices/);
    expect(screen.getByTestId('price-total')).toHaveTextContent('$40.00');
    expect(screen.getByText('Subtotal · Cutting').nextElementSibling).toHaveTextContent('$6.00');
  });
});
