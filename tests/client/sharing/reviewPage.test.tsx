// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import ReviewPage from '@/features/reviews/components/ReviewPage';
import type { Review } from '@/features/reviews/api/schemas';
import { demoDesigns } from '@/domain/fixtures';
import { makeUser, mockApi, renderRoutes } from '../testUtils';

vi.mock('@/components/viewer', async (importOriginal) => (await import('./viewerStub')).viewerWithoutCanvas(importOriginal));

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const me = { status: 200, body: { user: makeUser('customer') } };
const rack = demoDesigns.find((design) => /rack/i.test(design.name))!;
const customer = { id: 4, displayName: 'Priya Lindqvist', role: 'customer' };

function review(overrides: Partial<Review> = {}): Review {
  return {
    design: { id: 5, name: rack.name, latestRevision: 2 },
    revision: { number: 2, createdAt: '2026-11-30T10:00:00.000Z', document: rack },
    decisions: [],
    comments: [
      { id: 11, revision: 2, partId: 'p3', position: [100, 400, -50], body: 'Can this shelf sit 50 mm lower?', parentId: null, author: customer, createdAt: '2026-12-01T08:00:00.000Z' },
      { id: 12, revision: 2, partId: null, position: null, body: 'Yes, I will move it.', parentId: 11, author: { id: 2, displayName: 'Tomasz Reyes', role: 'designer' }, createdAt: '2026-12-01T08:30:00.000Z' },
    ],
    ...overrides,
  };
}

function renderReview() {
  return renderRoutes([{ path: '/reviews/:designId', element: <ReviewPage /> }], '/reviews/5');
}

describe('review page (customer)', () => {
  it('shows the comment thread in order, pinned comments numbered, with author and part', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/reviews/5': { status: 200, body: review() } });
    renderReview();
    expect(await screen.findByRole('heading', { name: rack.name })).toBeInTheDocument();
    const comments = within(screen.getByRole('region', { name: 'Comments' })).getAllByTestId('comment');
    expect(comments).toHaveLength(2);
    expect(comments[0]).toHaveTextContent('Pin 1 · Priya Lindqvist');
    expect(comments[0]).toHaveTextContent('part p3 · rev 2');
    expect(comments[0]).toHaveTextContent('Can this shelf sit 50 mm lower?');
    expect(comments[1]).not.toHaveTextContent('Pin');
    expect(comments[1]).toHaveTextContent('Tomasz Reyes');
  });

  it('approves the shown revision with the note through the API', async () => {
    const fetchMock = mockApi({
      'GET /api/auth/me': me,
      'GET /api/reviews/5': { status: 200, body: review() },
      'POST /api/reviews/5/decisions': ({ body }) => ({
        status: 201,
        body: { decision: { id: 1, revision: 2, decision: (body as { decision: string }).decision, note: 'Looks right', decidedBy: { id: 4, displayName: 'Priya Lindqvist' }, decidedAt: new Date().toISOString() } },
      }),
    });
    renderReview();
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Note with your decision'), 'Looks right');
    await user.click(screen.getByRole('button', { name: 'Approve revision 2' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledWith('/api/reviews/5/decisions', expect.objectContaining({ method: 'POST' })));
    const call = fetchMock.mock.calls.find(([url]) => url === '/api/reviews/5/decisions')!;
    expect(JSON.parse(call[1]!.body as string)).toEqual({ revision: 2, decision: 'approved', note: 'Looks right' });
  });

  it('asks for changes through the same route', async () => {
    const fetchMock = mockApi({
      'GET /api/auth/me': me,
      'GET /api/reviews/5': { status: 200, body: review() },
      'POST /api/reviews/5/decisions': { status: 201, body: { decision: { id: 1, revision: 2, decision: 'changes_requested', note: '', decidedBy: { id: 4, displayName: 'Priya Lindqvist' }, decidedAt: new Date().toISOString() } } },
    });
    renderReview();
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Ask for changes' }));
    await waitFor(() => expect(fetchMock.mock.calls.some(([url]) => url === '/api/reviews/5/decisions')).toBe(true));
    const call = fetchMock.mock.calls.find(([url]) => url === '/api/reviews/5/decisions')!;
    expect(JSON.parse(call[1]!.body as string)).toMatchObject({ decision: 'changes_requested' });
  });
});
