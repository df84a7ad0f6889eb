import type { Database } from './database';

/**
 * Values read from the database, kept in memory until any write finishes (`db.changeCount()`
 * moves), for reads every request repeats (its session row, its user). A value read while a write
 * finished is not kept. As with the hot reads (decision 0003), this holds while one server process
 * owns the database. At most `max` values; past that the lot is dropped and refilled.
 */
export function keptReads<K, V>(db: Database, max: number) {
  const kept = new Map<K, V>();
  let generation = db.changeCount();
  return async function read(key: K, load: () => Promise<V>): Promise<V> {
    const before = db.changeCount();
    if (before !== generation) {
      kept.clear();
      generation = before;
    }
    if (kept.has(key)) return kept.get(key) as V;
    const value = await load();
    if (db.changeCount() === before && generation === before) {
      if (kept.size >= max) kept.clear();
      kept.set(key, value);
    }
    return value;
  };
}
