/** Sequelize writes SQLite dates as "YYYY-MM-DD HH:MM:SS.SSS +00:00"; raw queries return that text. */
export function sqliteDateToIso(value: string | Date | null): string {
  if (value === null) return new Date(0).toISOString();
  if (value instanceof Date) return value.toISOString();
  const iso = value.replace(' ', 'T').replace(/ ?([+-]\d\d:\d\d)$/, '$1').replace(/\+00:00$/, 'Z');
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? value : date.toISOString();
}
