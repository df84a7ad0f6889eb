/** Words shared by the domain's messages and the screens. */

/**
 * "1 note", "2 notes", "0 errors": a count with its noun, singular only for exactly one.
 * `plural` defaults to the singular plus "s"; give it for irregular nouns ("1 notch", "2 notches").
 */
export function countOf(count: number, singular: string, plural = `${singular}s`): string {
  const shown = Number.isInteger(count) ? String(count).replace(/\B(?=(\d{3})+(?!\d))/g, ',') : String(count);
  return `${shown} ${count === 1 ? singular : plural}`;
}
