/** Fresh ids for new parts: `${prefix}-${n}` with n above any number already used with that prefix. */
import { collectIds } from './references';
import type { DesignDocument } from './schema';

export interface IdAllocator {
  next(prefix: string): string;
  has(id: string): boolean;
}

/** One pass over the document, then O(1) per id: use it when adding many parts. */
export function createIdAllocator(design: DesignDocument): IdAllocator {
  const used = new Set(collectIds(design).map((x) => x.id));
  const counters = new Map<string, number>();
  return {
    has: (id) => used.has(id),
    next(prefix) {
      let n = counters.get(prefix) ?? 1;
      let id = `${prefix}-${n}`;
      while (used.has(id)) {
        n++;
        id = `${prefix}-${n}`;
      }
      counters.set(prefix, n + 1);
      used.add(id);
      return id;
    },
  };
}

/** A fresh id for one new part. */
export function newId(prefix: string, design: DesignDocument): string {
  return createIdAllocator(design).next(prefix);
}
