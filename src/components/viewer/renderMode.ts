/**
 * `?renderMode=per-part` (development and tests only) draws one mesh per part instead of one
 * instanced mesh per shape and material, so the benchmark can compare the two in one run.
 */
export type RenderMode = 'instanced' | 'per-part';

export function renderModeFromUrl(search: string = typeof window === 'undefined' ? '' : window.location.search): RenderMode {
  return new URLSearchParams(search).get('renderMode') === 'per-part' ? 'per-part' : 'instanced';
}
