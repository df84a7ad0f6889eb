// @vitest-environment jsdom
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderHook, waitFor } from '@testing-library/react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { createQueryClient } from '@/lib/queryClient';
import { designKeys } from '@/lib/queryKeys';
import { editorDesignQueryOptions } from '@/features/editor/api/getEditorDesign';
import { useSaveDesignRevision } from '@/features/editor/api/saveDesignRevision';
import { viewerDesignQueryOptions } from '@/features/viewer/api/getViewerDesign';
import { buildRevisionQueryOptions } from '@/features/workbench/api/getBuildRevision';
import { useDeleteDesign } from '@/features/designs/api/deleteDesign';
import { historyQueryOptions } from '@/features/designs/api/getHistory';
import { twoRailDesign } from './editor/fixtures';
import { mockApi } from './testUtils';

const person = { id: 2, displayName: 'Tomasz Reyes' };
const summary = { id: 7, name: 'Rack', systemId: 'metric-40', latestRevision: 1, updatedAt: '2026-01-01T00:00:00Z', updatedBy: person, thumbnailUrl: null, profileCount: 2, approval: null };
const detail = { design: summary, revision: { number: 1, createdAt: '2026-01-01T00:00:00Z', createdBy: person, message: null, thumbnailUrl: null, document: twoRailDesign() } };

function wrapperFor(client: QueryClient) {
  return ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('one query key factory per resource', () => {
  it('caches GET /api/designs/:id once, whether the editor or the viewer asks', () => {
    expect(editorDesignQueryOptions(7).queryKey).toEqual(designKeys.detail(7));
    expect(viewerDesignQueryOptions(7).queryKey).toEqual(designKeys.detail(7));
  });

  it('keeps everything about one design under its detail key', () => {
    expect(buildRevisionQueryOptions(7, 3).queryKey.slice(0, 3)).toEqual(designKeys.detail(7));
    expect(historyQueryOptions(7).queryKey.slice(0, 3)).toEqual(designKeys.detail(7));
  });

  it('a save moves the shared cached design to the new revision and marks the designs list stale', async () => {
    mockApi({
      'POST /api/designs/7/revisions': {
        status: 201,
        body: { revision: { number: 2, createdAt: '2026-01-02T00:00:00Z', createdBy: person, message: null, thumbnailUrl: null, profileCount: 2 } },
      },
    });
    const client = createQueryClient({ retry: false });
    client.setQueryData(designKeys.detail(7), detail);
    client.setQueryData(designKeys.list(), [summary]);
    const { result } = renderHook(() => useSaveDesignRevision(), { wrapper: wrapperFor(client) });
    await result.current.mutateAsync({ designId: 7, baseRevision: 1, document: twoRailDesign() });
    // The viewer reads the same entry the editor's save wrote.
    expect(client.getQueryData(viewerDesignQueryOptions(7).queryKey)?.revision.number).toBe(2);
    expect(client.getQueryState(designKeys.list())?.isInvalidated).toBe(true);
    expect(client.getQueryState(designKeys.detail(7))?.isInvalidated).toBe(false);
  });

  it('a delete drops the design and its revisions from the cache and refreshes the list', async () => {
    mockApi({ 'DELETE /api/designs/7': { status: 204 }, 'GET /api/designs': { status: 200, body: { designs: [] } } });
    const client = createQueryClient({ retry: false });
    client.setQueryData(designKeys.detail(7), detail);
    client.setQueryData(designKeys.revision(7, 1), twoRailDesign());
    client.setQueryData(designKeys.list(), [summary]);
    const { result } = renderHook(() => useDeleteDesign(), { wrapper: wrapperFor(client) });
    await result.current.mutateAsync(7);
    await waitFor(() => expect(client.getQueryData(designKeys.detail(7))).toBeUndefined());
    expect(client.getQueryData(designKeys.revision(7, 1))).toBeUndefined();
    expect(client.getQueryData(designKeys.list())).toEqual([]);
  });
});
