// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import DesignsPage from '@/features/designs/components/DesignsPage';
import type { DesignSummary } from '@/features/designs/api/schemas';
import { makeUser, mockApi, renderRoutes } from './testUtils';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.useRealTimers();
});

const minutesAgo = (minutes: number) => new Date(Date.now() - minutes * 60_000).toISOString();

function summary(overrides: Partial<DesignSummary>): DesignSummary {
  return {
    id: 1,
    name: 'Plant rack',
    systemId: 'metric-20',
    latestRevision: 1,
    updatedAt: minutesAgo(3),
    updatedBy: { id: 2, displayName: 'Tomasz Reyes' },
    thumbnailUrl: null,
    profileCount: 12,
    approval: null,
    ...overrides,
  };
}

const me = { status: 200, body: { user: makeUser('designer') } };

function renderDesigns() {
  return renderRoutes(
    [
      { path: '/designs', element: <DesignsPage /> },
      { path: '/designs/:designId', element: <p>Editor opened</p> },
    ],
    '/designs',
  );
}

describe('designs list', () => {
  it('shows each design with its system, profile count and who changed it when', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/designs': { status: 200, body: { designs: [summary({})] } } });
    renderDesigns();
    const list = await screen.findByRole('list', { name: 'Designs' });
    const card = within(list).getByRole('listitem');
    expect(within(card).getByRole('link', { name: 'Plant rack' })).toHaveAttribute('href', '/designs/1');
    expect(card).toHaveTextContent('Metric 20 mm'); // the catalogue's name for 'metric-20'
    expect(card).toHaveTextContent('12 profiles');
    expect(card).toHaveTextContent('Updated 3 min ago by Tomasz');
    expect(within(card).getByRole('img', { name: 'No picture saved yet' })).toBeInTheDocument();
  });

  it('offers to create the first design when there are none', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/designs': { status: 200, body: { designs: [] } } });
    renderDesigns();
    expect(await screen.findByRole('heading', { name: 'No designs yet' })).toBeInTheDocument();
    expect(screen.getAllByRole('button', { name: 'New design' })).toHaveLength(2);
  });

  it('creates a design from the dialog and opens it in the editor', async () => {
    const fetchMock = mockApi({
      'GET /api/auth/me': me,
      'GET /api/designs': { status: 200, body: { designs: [] } },
      'POST /api/designs': ({ body }) => ({
        status: 201,
        body: {
          design: summary({ id: 42, name: (body as { name: string }).name, profileCount: 0 }),
          revision: { number: 1, createdAt: minutesAgo(0), createdBy: { id: 2, displayName: 'Tomasz Reyes' }, message: null, thumbnailUrl: null, document: {} },
        },
      }),
    });
    const { router } = renderDesigns();
    const user = userEvent.setup();
    await user.click((await screen.findAllByRole('button', { name: 'New design' }))[0]);
    const dialog = screen.getByRole('dialog', { name: 'New design' });
    await user.type(within(dialog).getByLabelText('Name'), 'Router table');
    await user.selectOptions(within(dialog).getByLabelText('Profile system'), 'inch-1.5');
    await user.click(within(dialog).getByLabelText('Inches (in)'));
    await user.click(within(dialog).getByRole('button', { name: 'Create and open' }));

    expect(await screen.findByText('Editor opened')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/designs/42');
    const post = fetchMock.mock.calls.find(([url, init]) => url === '/api/designs' && init?.method === 'POST');
    expect(JSON.parse(String(post?.[1]?.body))).toEqual({ name: 'Router table', systemId: 'inch-1.5', units: 'in' });
  });

  it('asks for a name beside the field before creating', async () => {
    const fetchMock = mockApi({ 'GET /api/auth/me': me, 'GET /api/designs': { status: 200, body: { designs: [] } } });
    renderDesigns();
    const user = userEvent.setup();
    await user.click((await screen.findAllByRole('button', { name: 'New design' }))[0]);
    await user.click(screen.getByRole('button', { name: 'Create and open' }));
    expect(await screen.findByText('Give the design a name.')).toBeInTheDocument();
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(false);
  });

  it('puts a deleted design back and says why when the server refuses', async () => {
    mockApi({
      'GET /api/auth/me': me,
      'GET /api/designs': { status: 200, body: { designs: [summary({})] } },
      'DELETE /api/designs/1': { status: 403, body: { error: { code: 'forbidden', message: 'Only the owner or the person who created a design can delete it.' } } },
    });
    renderDesigns();
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Delete Plant rack' }));
    await user.click(within(screen.getByRole('alertdialog')).getByRole('button', { name: 'Delete design' }));

    expect(await screen.findByText('Only the owner or the person who created a design can delete it.')).toBeInTheDocument();
    await waitFor(() => expect(screen.getByRole('link', { name: 'Plant rack' })).toBeInTheDocument());
  });
});
