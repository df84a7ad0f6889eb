import type * as Viewer from '@/components/viewer';

/**
 * jsdom has no WebGL: pages under test get a stand-in for the shared 3D view (the rest of the viewer
 * layer, player controls included, is the real code). Use with
 * `vi.mock('@/components/viewer', async (original) => (await import('./viewerStub')).viewerWithoutCanvas(original))`.
 */
export async function viewerWithoutCanvas(importOriginal: () => Promise<unknown>) {
  const actual = (await importOriginal()) as typeof Viewer;
  return {
    ...actual,
    DesignViewer: ({ testId }: { testId?: string }) => <div data-testid={testId ?? 'design-viewer'} />,
  };
}
