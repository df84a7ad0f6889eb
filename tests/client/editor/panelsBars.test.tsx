// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { StockPlanPicture } from '@/components/outputs/StockPlanPicture';
import { OutputsDock } from '@/features/editor/panels/OutputsDock';
import { BarsTab } from '@/components/outputs/BarsTab';
import { handMadeAnalysis, historyLength, renderWithStore, shelfDesign, storeWithAnalysis } from './panelsFixtures';

afterEach(cleanup);

describe('Bars tab (stock plan picture)', () => {
  it('draws one bar per stock bar and one cut per cut, with kerf slivers and hatched offcuts', () => {
    const { plan } = handMadeAnalysis().stockPlans[0];
    const { container } = render(<StockPlanPicture variantId="m40-40x40" plan={plan} stockLength={1000} kerf={4} endTrim={10} units="mm" />);
    const bars = container.querySelectorAll('[data-kind="bar"]');
    expect(bars).toHaveLength(3);
    expect(container.querySelectorAll('[data-kind="cut"]')).toHaveLength(4);
    expect(bars[2].querySelectorAll('[data-kind="cut"]')).toHaveLength(2);
    expect(container.querySelectorAll('[data-kind="kerf"]')).toHaveLength(4);
    expect(container.querySelectorAll('[data-kind="offcut"][data-reusable="true"]')).toHaveLength(3);
    expect(bars[0]).toHaveAttribute('aria-label', 'Bar 1: 1 cuts, offcut 386 mm, reusable');
  });

  it('draws cuts to scale: a 600 mm cut is one and a half times a 400 mm cut', () => {
    const { plan } = handMadeAnalysis().stockPlans[0];
    const { container } = render(<StockPlanPicture variantId="m40-40x40" plan={plan} stockLength={1000} kerf={4} endTrim={10} units="mm" />);
    const widths = [...container.querySelectorAll('[data-kind="cut"] rect')].map((rect) => Number(rect.getAttribute('width')));
    expect(widths[0] / widths[2]).toBeCloseTo(1.5, 6);
  });

  it('marks an offcut below the keep length as not reusable', () => {
    const { plan } = handMadeAnalysis().stockPlans[0];
    const short = { ...plan, bars: [{ ...plan.bars[2], offcut: 100, reusable: false }] };
    const { container } = render(<StockPlanPicture variantId="m40-40x40" plan={short} stockLength={1000} kerf={4} endTrim={10} units="mm" />);
    expect(container.querySelector('[data-kind="offcut"]')).toHaveAttribute('data-reusable', 'false');
  });

  it('shows bars needed against the lower bound and first-fit decreasing', () => {
    const store = storeWithAnalysis();
    renderWithStore(<OutputsDock initialTab="bars" />, store);
    expect(screen.getByText('Bars needed').nextElementSibling).toHaveTextContent('3 bars');
    expect(screen.getByText('Lower bound').nextElementSibling).toHaveTextContent('3 bars');
    expect(screen.getByText('First-fit decreasing').nextElementSibling).toHaveTextContent('3 bars');
  });

  it('changes the stock length as one undoable command and refuses a negative kerf beside the field', async () => {
    const user = userEvent.setup();
    const store = storeWithAnalysis();
    renderWithStore(<OutputsDock initialTab="bars" />, store);
    const kerf = screen.getByLabelText('Saw kerf (mm)');
    await user.clear(kerf);
    await user.type(kerf, '-2');
    await user.click(screen.getByRole('button', { name: 'Re-plan bars' }));
    expect(screen.getByText('Cannot be negative.')).toBeInTheDocument();
    expect(kerf).toHaveAttribute('aria-invalid', 'true');
    expect(historyLength(store)).toBe(0);

    await user.clear(kerf);
    await user.type(kerf, '3');
    const stock = screen.getByLabelText('Stock bar length (mm)');
    await user.clear(stock);
    await user.type(stock, '6000');
    await user.click(screen.getByRole('button', { name: 'Re-plan bars' }));
    expect(historyLength(store)).toBe(1);
    expect(store.getState().design.settings).toMatchObject({ stockLength: 6000, kerf: 3, endTrim: 10 });
    store.getState().undo();
    expect(store.getState().design.settings).toMatchObject({ stockLength: 1000, kerf: 4 });
  });

  it('leaves untouched settings exactly as stored when an inch user changes one field', async () => {
    const user = userEvent.setup();
    const store = storeWithAnalysis();
    store.setState({ units: 'in' });
    renderWithStore(<OutputsDock initialTab="bars" />, store);
    const kerf = screen.getByLabelText('Saw kerf (in)');
    await user.clear(kerf);
    await user.type(kerf, '1/8');
    await user.click(screen.getByRole('button', { name: 'Re-plan bars' }));
    // 1/8 in = 3.175 mm exactly (25.4 mm per inch); the 1000 mm stock length is not re-read from 39-3/8 in.
    expect(store.getState().design.settings).toMatchObject({ kerf: 3.175, stockLength: 1000, endTrim: 10 });
  });

  it('draws the first 40 bars of a long plan and the rest on request', async () => {
    const user = userEvent.setup();
    const { variantId, plan } = handMadeAnalysis().stockPlans[0];
    const bars = Array.from({ length: 45 }, (_, index) => ({ ...plan.bars[0], index, cuts: [{ id: `c${index}`, length: 600 }] }));
    const { container } = render(
      <BarsTab stockPlans={[{ variantId, plan: { ...plan, bars, barCount: 45 } }]} settings={shelfDesign().settings} units="mm" />,
    );
    expect(container.querySelectorAll('[data-kind="bar"]')).toHaveLength(40);
    await user.click(screen.getByRole('button', { name: 'Draw all 45 bars' }));
    expect(container.querySelectorAll('[data-kind="bar"]')).toHaveLength(45);
  });
});
