// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import LinkViewerPage from '@/features/linkViewer/components/LinkViewerPage';
import { demoDesigns } from '@/domain/fixtures';
import { mockApi, renderRoutes } from '../testUtils';

vi.mock('@/components/viewer', async (importOriginal) => (await import('./viewerStub')).viewerWithoutCanvas(importOriginal));

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const TOKEN = 'a'.repeat(43);
const enclosure = demoDesigns.find((design) => /enclosure/i.test(design.name))!;
const shared = {
  link: { label: 'Frames 101', pinnedRevision: null, expiresAt: null },
  design: { name: enclosure.name, systemId: enclosure.systemId, latestRevision: 2 },
  revision: { number: 2, createdAt: '2026-11-30T10:00:00.000Z', document: enclosure },
};

function renderLink() {
  return renderRoutes([{ path: '/view/:token', element: <LinkViewerPage /> }], `/view/${TOKEN}`);
}

describe('read-only link viewer', () => {
  it('shows the shared design with the step player, its explode slider and the section toggle', async () => {
    mockApi({ [`GET /api/shared/${TOKEN}`]: { status: 200, body: shared } });
    renderLink();
    expect(await screen.findByRole('heading', { name: enclosure.name })).toBeInTheDocument();
    expect(screen.getByText(/Read-only view · revision 2 · Frames 101/)).toBeInTheDocument();
    const player = screen.getByTestId('step-player');
    // The player opens on the finished piece: the last step, with "next" disabled.
    const current = within(player).getByTestId('current-step');
    const total = Number(current.textContent!.match(/of (\d+)/)![1]);
    expect(total).toBeGreaterThanOrEqual(4);
    expect(current).toHaveTextContent(`Step ${total} of ${total}`);
    expect(within(player).getByRole('button', { name: 'Next step' })).toBeDisabled();
    expect(within(player).getByLabelText('Explode the finished piece')).toHaveValue('0');
    const steps = screen.getByRole('list', { name: 'Assembly steps' });
    expect(within(steps).getAllByRole('button')).toHaveLength(total);

    const user = userEvent.setup();
    await user.click(within(player).getByRole('button', { name: 'Previous step' }));
    expect(current).toHaveTextContent(`Step ${total - 1} of ${total}`);
    // The arrow keys step too.
    fireEvent.keyDown(window, { key: 'ArrowLeft' });
    expect(current).toHaveTextContent(`Step ${total - 2} of ${total}`);

    // The section view: off until an axis is chosen, then a position slider for that axis.
    expect(screen.queryByLabelText(/Section position/)).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Y' }));
    expect(screen.getByRole('button', { name: 'Y' })).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByLabelText('Section position along Y')).toBeInTheDocument();

    // The steps panel can be hidden; nothing on the page saves.
    await user.click(screen.getByRole('button', { name: 'Steps' }));
    expect(screen.queryByTestId('step-player')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /save/i })).not.toBeInTheDocument();
  });

  it('offers glTF and USDZ downloads, and no room view where the browser has no AR', async () => {
    mockApi({ [`GET /api/shared/${TOKEN}`]: { status: 200, body: shared } });
    renderLink();
    await screen.findByRole('heading', { name: enclosure.name });
    expect(screen.getByRole('button', { name: 'glTF' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'USDZ' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'See it in the room' })).not.toBeInTheDocument();
    expect(screen.queryByTestId('quick-look-link')).not.toBeInTheDocument();
  });

  it('offers "See it in the room" where the browser can start an immersive-ar session', async () => {
    const isSessionSupported = vi.fn(async (mode: string) => mode === 'immersive-ar');
    vi.stubGlobal('navigator', Object.assign(Object.create(navigator), { xr: { isSessionSupported } }));
    mockApi({ [`GET /api/shared/${TOKEN}`]: { status: 200, body: shared } });
    renderLink();
    expect(await screen.findByRole('button', { name: 'See it in the room' })).toBeInTheDocument();
    expect(isSessionSupported).toHaveBeenCalledWith('immersive-ar');
  });

  it('says the link does not work when the server answers 404 (expired, revoked or unknown)', async () => {
    mockApi({});
    renderLink();
    const notice = await screen.findByTestId('link-error');
    expect(notice).toHaveTextContent('This link does not work');
    expect(notice).toHaveTextContent('Ask whoever sent it for a new one');
    expect(screen.queryByTestId('step-player')).not.toBeInTheDocument();
  });
});
