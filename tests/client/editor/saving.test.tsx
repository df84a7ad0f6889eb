// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { QueryClientProvider } from '@tanstack/react-query';
import { createQueryClient } from '@/lib/queryClient';
import { StaleRevisionDialog } from '@/features/editor/saving/StaleRevisionDialog';
import { useSaveDesign } from '@/features/editor/saving/useSaveDesign';
import { updateProfileCommand } from '@/features/editor/commands/patchCommands';
import { createEditorStore, EditorStoreProvider } from '@/features/editor/store/editorStore';
import { twoRailDesign } from './fixtures';

const person = { id: 2, displayName: 'Tomasz Reyes' };
const theirs = { ...twoRailDesign(), name: 'Their version' };

function Harness() {
  const saveState = useSaveDesign();
  return (
    <>
      <button type="button" onClick={() => void saveState.save()}>
        Save now
      </button>
      {saveState.error ? <p role="alert">{saveState.error}</p> : null}
      <StaleRevisionDialog saveState={saveState} />
    </>
  );
}

function setup() {
  const store = createEditorStore();
  store.getState().loadDesign(twoRailDesign(), { designId: 1, revision: 1, savedAt: '2026-01-01T00:00:00Z', savedBy: 'Tomasz Reyes' });
  store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 640 }));
  render(
    <QueryClientProvider client={createQueryClient({ retry: false })}>
      <EditorStoreProvider store={store}>
        <Harness />
      </EditorStoreProvider>
    </QueryClientProvider>,
  );
  return store;
}

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

let requests: { method: string; url: string; body: unknown }[] = [];
let downloads: Blob[] = [];

beforeEach(() => {
  requests = [];
  downloads = [];
  vi.stubGlobal('URL', Object.assign(URL, { createObjectURL: (blob: Blob) => (downloads.push(blob), 'blob:local'), revokeObjectURL: () => {} }));
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => {});
});

afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
  vi.unstubAllGlobals();
});

function serve(handler: (method: string, url: string, body: unknown) => Response) {
  vi.stubGlobal('fetch', async (url: string, init: RequestInit = {}) => {
    const method = init.method ?? 'GET';
    const body = init.body ? JSON.parse(String(init.body)) : undefined;
    requests.push({ method, url, body });
    return handler(method, url, body);
  });
}

describe('saving a design', () => {
  it('posts the design with the revision it was based on and marks it saved', async () => {
    serve((_method, _url, body) => json(201, { revision: { number: 2, document: (body as { document: unknown }).document, createdAt: new Date().toISOString(), createdBy: person, message: null, thumbnailUrl: null } }));
    const store = setup();
    await userEvent.click(screen.getByRole('button', { name: 'Save now' }));
    await waitFor(() => expect(store.getState().dirty).toBe(false));
    expect(requests[0]).toMatchObject({ method: 'POST', url: '/api/designs/1/revisions', body: { baseRevision: 1 } });
    expect((requests[0].body as { document: { profiles: { length: number }[] } }).document.profiles[0].length).toBe(640);
    expect(store.getState().baseRevision).toBe(2);
    expect(store.getState().lastSaved).toMatchObject({ revision: 2, by: 'Tomasz Reyes' });
  });

  it('keeps every local edit when the save is stale and the person keeps editing', async () => {
    serve(() => json(409, { error: { code: 'stale_revision', message: 'Someone saved first.', latestRevision: 3 } }));
    const store = setup();
    const mine = store.getState().design;
    await userEvent.click(screen.getByRole('button', { name: 'Save now' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Someone saved revision 3 while you were editing' });
    expect(dialog).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Keep editing' }));
    expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument();
    expect(store.getState().design).toBe(mine);
    expect(store.getState().dirty).toBe(true);
    expect(store.getState().baseRevision).toBe(1);
  });

  it('loading theirs first downloads the local design as JSON, then loads their revision (not undoable)', async () => {
    serve((method) =>
      method === 'POST'
        ? json(409, { error: { code: 'stale_revision', message: 'Someone saved first.', latestRevision: 3 } })
        : json(200, {
            design: { id: 1, name: 'Their version', systemId: 'metric-40', latestRevision: 3, updatedAt: '2026-01-02T00:00:00Z', updatedBy: { id: 3, displayName: 'Noor Okafor' }, thumbnailUrl: null, profileCount: 2 },
            revision: { number: 3, document: theirs, createdAt: '2026-01-02T00:00:00Z', createdBy: { id: 3, displayName: 'Noor Okafor' }, message: null, thumbnailUrl: null },
          }),
    );
    const store = setup();
    await userEvent.click(screen.getByRole('button', { name: 'Save now' }));
    await userEvent.click(await screen.findByRole('button', { name: /Load theirs/ }));
    await waitFor(() => expect(store.getState().design.name).toBe('Their version'));
    expect(downloads).toHaveLength(1);
    const saved = JSON.parse(await downloads[0].text());
    expect(saved.profiles[0].length).toBe(640);
    expect(store.getState().baseRevision).toBe(3);
    expect(store.getState().dirty).toBe(false);
    expect(store.temporal.getState().pastStates).toHaveLength(0);
    expect(store.getState().lastSaved).toMatchObject({ revision: 3, by: 'Noor Okafor' });
  });

  it('says why a save failed and leaves the design dirty', async () => {
    serve(() => json(400, { error: { code: 'invalid', message: 'The design has a profile with no length.' } }));
    const store = setup();
    await userEvent.click(screen.getByRole('button', { name: 'Save now' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('The design has a profile with no length.');
    expect(store.getState().dirty).toBe(true);
  });
});
