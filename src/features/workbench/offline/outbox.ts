/**
 * The tick outbox: every tick is written here first (IndexedDB through idb-keyval), then sent.
 * While the server cannot be reached the ticks wait and the page lists them; they are sent again
 * when the browser comes back online. The server stores a tick once per clientId, so sending twice
 * is harmless.
 */
import { get, set } from 'idb-keyval';
import { isApiError } from '@/lib/apiClient';
import type { TickInput, TickResponse } from '../api/postProgress';

export interface QueuedTick extends TickInput {
  buildId: number;
  revision: number;
}

export interface OutboxStorage {
  load(): Promise<QueuedTick[]>;
  save(items: QueuedTick[]): Promise<void>;
}

export type Send = (buildId: number, revision: number, ticks: TickInput[]) => Promise<TickResponse>;

export interface FlushResult {
  sent: number;
  /** Answers from the server, per build (the latest one). */
  responses: Map<number, TickResponse>;
  /** Ticks the server refused for good (403, 404, 400): dropped, with the reason. */
  refused: { tick: QueuedTick; message: string }[];
  /** True when the server could not be reached; the rest waits. */
  offline: boolean;
}

const KEY = 'slotwise-tick-outbox';

export const idbOutboxStorage: OutboxStorage = {
  load: async () => (await get<QueuedTick[]>(KEY)) ?? [],
  save: (items) => set(KEY, items),
};

export function createOutbox(storage: OutboxStorage, send: Send) {
  let items: QueuedTick[] | null = null;
  let chain: Promise<unknown> = Promise.resolve();
  const listeners = new Set<(items: QueuedTick[]) => void>();

  const loaded = async () => (items ??= await storage.load());
  const notify = () => listeners.forEach((listener) => listener([...(items ?? [])]));
  /** One operation at a time, so a flush never races an add. */
  const serial = <T>(work: () => Promise<T>): Promise<T> => {
    const next = chain.then(work, work);
    chain = next.catch(() => undefined);
    return next;
  };

  return {
    subscribe(listener: (items: QueuedTick[]) => void): () => void {
      listeners.add(listener);
      void loaded().then(() => listener([...(items ?? [])]));
      return () => listeners.delete(listener);
    },

    add(tick: QueuedTick): Promise<void> {
      return serial(async () => {
        (await loaded()).push(tick);
        await storage.save(items!);
        notify();
      });
    },

    pending(): Promise<QueuedTick[]> {
      return serial(async () => [...(await loaded())]);
    },

    /** Sends everything queued, grouped by build and revision, oldest first. */
    flush(): Promise<FlushResult> {
      return serial(async () => {
        const result: FlushResult = { sent: 0, responses: new Map(), refused: [], offline: false };
        const queue = await loaded();
        const groups = new Map<string, QueuedTick[]>();
        for (const tick of queue) groups.set(`${tick.buildId}:${tick.revision}`, [...(groups.get(`${tick.buildId}:${tick.revision}`) ?? []), tick]);
        for (const group of groups.values()) {
          const { buildId, revision } = group[0];
          try {
            const response = await send(buildId, revision, group.map(({ clientId, kind, itemKey, done, madeAt }) => ({ clientId, kind, itemKey, done, madeAt })));
            result.responses.set(buildId, response);
            result.sent += group.length;
          } catch (error) {
            if (isApiError(error) && error.status >= 400 && error.status < 500 && error.status !== 408 && error.status !== 429) {
              for (const tick of group) result.refused.push({ tick, message: error.message });
            } else {
              result.offline = true;
              continue;
            }
          }
          const done = new Set(group.map((tick) => tick.clientId));
          items = (items ?? []).filter((tick) => !done.has(tick.clientId));
          await storage.save(items);
        }
        notify();
        return result;
      });
    },
  };
}

export type Outbox = ReturnType<typeof createOutbox>;
