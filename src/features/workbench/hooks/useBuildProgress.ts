import { useCallback, useEffect, useMemo, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { BuildDetail, BuildNotice, ProgressKind } from '@/domain/contracts/builds';
import { buildKeys } from '@/lib/queryKeys';
import type { QueuedTick } from '../offline/outbox';
import { tickOutbox } from '../offline/tickOutbox';
import { useOnline } from './useOnline';

export interface BuildProgress {
  /** `${kind}:${itemKey}` → done, server records and waiting ticks together (the latest wins). */
  isDone(kind: ProgressKind, itemKey: string): boolean;
  /** Who ticked an item done, and when (every builder's record is kept). */
  whoTicked(kind: ProgressKind, itemKey: string): { name: string; at: string; waiting: boolean }[];
  tick(kind: ProgressKind, itemKey: string, done: boolean): void;
  waiting: QueuedTick[];
  online: boolean;
  /** The server could not be reached on the last send. */
  unreachable: boolean;
  notice: BuildNotice | null;
  refusal: string | null;
}

const newId = () => (typeof crypto !== 'undefined' && 'randomUUID' in crypto ? crypto.randomUUID() : `t-${Date.now()}-${Math.random().toString(16).slice(2)}`);

/** Progress of one build: ticks go to the outbox first and are sent at once, or when back online. */
export function useBuildProgress(detail: BuildDetail | undefined, canTick: boolean): BuildProgress {
  const queryClient = useQueryClient();
  const online = useOnline();
  const [queue, setQueue] = useState<QueuedTick[]>([]);
  const [unreachable, setUnreachable] = useState(false);
  const [notice, setNotice] = useState<BuildNotice | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);
  const buildId = detail?.build.id;

  useEffect(() => tickOutbox.subscribe(setQueue), []);

  const flush = useCallback(async () => {
    const result = await tickOutbox.flush();
    setUnreachable(result.offline);
    for (const [id, response] of result.responses) {
      const { notice: answer, stored: _stored, ...fresh } = response;
      queryClient.setQueryData(buildKeys.detail(id), fresh);
      if (id === buildId) setNotice(answer);
    }
    if (result.refused.length > 0) setRefusal(result.refused[0].message);
    if (result.sent > 0) void queryClient.invalidateQueries({ queryKey: buildKeys.lists() });
  }, [queryClient, buildId]);

  // Send what waits when the page opens and whenever the browser comes back online.
  useEffect(() => {
    if (online) void flush();
  }, [online, flush]);

  const waiting = useMemo(() => queue.filter((item) => item.buildId === buildId), [queue, buildId]);

  const state = useMemo(() => {
    const entries = [
      ...(detail?.records ?? []).map((record) => ({ ...record, name: record.madeBy.displayName, waiting: false })),
      ...waiting.filter((item) => item.revision === detail?.build.revision).map((item) => ({ ...item, name: 'You', waiting: true })),
    ].sort((a, b) => a.madeAt.localeCompare(b.madeAt));
    const done = new Map<string, boolean>();
    const who = new Map<string, { name: string; at: string; waiting: boolean }[]>();
    for (const entry of entries) {
      const key = `${entry.kind}:${entry.itemKey}`;
      done.set(key, entry.done);
      who.set(key, entry.done ? [...(who.get(key) ?? []), { name: entry.name, at: entry.madeAt, waiting: entry.waiting }] : []);
    }
    return { done, who };
  }, [detail, waiting]);

  const tick = useCallback(
    (kind: ProgressKind, itemKey: string, done: boolean) => {
      if (!detail || !canTick) return;
      setRefusal(null);
      void tickOutbox
        .add({ buildId: detail.build.id, revision: detail.build.revision, clientId: newId(), kind, itemKey, done, madeAt: new Date().toISOString() })
        .then(() => (navigator.onLine ? flush() : setUnreachable(true)));
    },
    [detail, canTick, flush],
  );

  return {
    isDone: (kind, itemKey) => state.done.get(`${kind}:${itemKey}`) ?? false,
    whoTicked: (kind, itemKey) => state.who.get(`${kind}:${itemKey}`) ?? [],
    tick,
    waiting,
    online,
    unreachable,
    notice,
    refusal,
  };
}
