/**
 * Query keys for designs and everything under one design, general to specific. The one factory
 * for these resources: every feature that reads or changes a design (designs list, editor,
 * viewer, workbench) builds its keys here, so one invalidation reaches every cached copy.
 */
export const designKeys = {
  all: ['designs'] as const,
  lists: () => [...designKeys.all, 'list'] as const,
  /** GET /api/designs */
  list: () => [...designKeys.lists()] as const,
  details: () => [...designKeys.all, 'detail'] as const,
  /** GET /api/designs/:id — the design and its latest revision (editor and viewer share it). */
  detail: (designId: number) => [...designKeys.details(), designId] as const,
  /** GET /api/designs/:id/revisions/:number — one stored revision (never changes). */
  revision: (designId: number, revision: number) => [...designKeys.detail(designId), 'revisions', revision] as const,
  /** GET /api/designs/:id/history */
  history: (designId: number) => [...designKeys.detail(designId), 'history'] as const,
  /** GET /api/designs/:id/diff?from&to */
  diff: (designId: number, from: number, to: number) => [...designKeys.detail(designId), 'diff', from, to] as const,
  /** GET /api/designs/:id/uploads */
  uploads: (designId: number) => [...designKeys.detail(designId), 'uploads'] as const,
};
