const SQLITE_UTC = /^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d\.\d{3} \+00:00$/;

/** Sequelize writes SQLite dates as "YYYY-MM-DD HH:MM:SS.SSS +00:00"; raw queries return that text. */
export function sqliteDateToIso(value: string | Date | null): string {
  if (value === null) return new Date(0).toISOString();
  if (value instanceof Date) return value.toISOString();
  // The common case, "2026-01-02 03:04:05.678 +00:00", without a Date round trip (lists call this per row).
  if (value.length === 30 && value.endsWith(' +00:00') && value[10] === ' ' && SQLITE_UTC.test(value)) return `${value.slice(0, 10)}T${value.slice(11, 23)}Z`;
  const iso = value.replace(' ', 'T').replace(/ ?([+-]\d\d:\d\d)$/, '$1').replace(/\+00:00$/, 'Z');
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? value : date.toISOString();
}
