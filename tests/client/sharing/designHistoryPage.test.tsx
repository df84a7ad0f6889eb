// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import DesignHistoryPage from '@/features/designs/components/DesignHistoryPage';
import type { HistoryRevision, RevisionDiff } from '@/features/designs/api/sharingSchemas';
import { makeUser, mockApi, renderRoutes } from '../testUtils';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const me = { status: 200, body: { user: makeUser('designer') } };
const tomasz = { id: 2, displayName: 'Tomasz Reyes' };
const revisions: HistoryRevision[] = [
  { number: 3, createdAt: '2026-12-01T09:00:00.000Z', createdBy: tomasz, message: 'Shelf lower', approval: { state: 'not_reviewed', by: null, at: null } },
  { number: 2, createdAt: '2026-11-30T09:00:00.000Z', createdBy: tomasz, message: null, approval: { state: 'approved', by: 'Priya Lindqvist', at: '2026-11-30T12:00:00.000Z' } },
  { number: 1, createdAt: '2026-11-29T09:00:00.000Z', createdBy: tomasz, message: 'First', approval: { state: 'changes_requested', by: 'Priya Lindqvist', at: '2026-11-29T12:00:00.000Z' } },
];
const diff = (from: number, to: number): RevisionDiff => ({
  from,
  to,
  bom: [{ code: 'SW-P20-20', description: 'Profile 20 × 20', unit: 'pcs', before: 12, after: 14, change: 2 }],
  cutList: [{ variantId: 'm20-20x20', length: 560, before: 4, after: 3, change: -1 }],
});

function renderHistory() {
  return renderRoutes([{ path: '/designs/:designId/history', element: <DesignHistoryPage /> }], '/designs/7/history');
}

describe('revision history page', () => {
  it('lists revisions with author and approval state, and compares the last two by default', async () => {
    mockApi({
      'GET /api/auth/me': me,
      'GET /api/designs/7/history': { status: 200, body: { revisions } },
      'GET /api/designs/7/diff?from=2&to=3': { status: 200, body: diff(2, 3) },
      'GET /api/designs/7/uploads': { status: 200, body: { uploads: [] } },
    });
    renderHistory();
    const table = await within(await screen.findByRole('region', { name: 'Revisions' })).findByRole('table');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(3);
    expect(rows[0]).toHaveTextContent('3');
    expect(rows[0]).toHaveTextContent('Tomasz Reyes');
    expect(rows[0]).toHaveTextContent('Shelf lower');
    expect(rows[0]).toHaveTextContent('Not reviewed');
    expect(rows[1]).toHaveTextContent('Approved by Priya Lindqvist');
    expect(rows[2]).toHaveTextContent('Changes asked by Priya Lindqvist');

    expect(await screen.findByRole('heading', { name: 'Revision 2 → 3' })).toBeInTheDocument();
    const bom = screen.getByRole('table', { name: 'Bill of materials changes' });
    expect(within(bom).getAllByRole('row')[1]).toHaveTextContent(/SW-P20-20.*12 pcs.*14 pcs.*\+2/);
    const cuts = screen.getByRole('table', { name: 'Cut list changes' });
    expect(within(cuts).getAllByRole('row')[1]).toHaveTextContent(/m20-20x20.*560.*4.*3.*-1/);
  });

  it('compares the revisions picked with the radio buttons', async () => {
    const fetchMock = mockApi({
      'GET /api/auth/me': me,
      'GET /api/designs/7/history': { status: 200, body: { revisions } },
      'GET /api/designs/7/diff?from=2&to=3': { status: 200, body: diff(2, 3) },
      'GET /api/designs/7/diff?from=1&to=3': { status: 200, body: { from: 1, to: 3, bom: [], cutList: [] } },
      'GET /api/designs/7/uploads': { status: 200, body: { uploads: [] } },
    });
    renderHistory();
    await screen.findByRole('heading', { name: 'Revision 2 → 3' });
    const firstRow = within(screen.getByRole('region', { name: 'Revisions' })).getAllByRole('row')[3];
    await userEvent.setup().click(within(firstRow).getByRole('radio', { name: 'from' }));
    expect(await screen.findByRole('heading', { name: 'Revision 1 → 3' })).toBeInTheDocument();
    expect(screen.getByText('The bill of materials and the cut list are the same.')).toBeInTheDocument();
    await waitFor(() => expect(fetchMock).toHaveBeenCalledWith('/api/designs/7/diff?from=1&to=3', expect.anything()));
  });
});
