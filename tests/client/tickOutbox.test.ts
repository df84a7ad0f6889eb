import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/apiClient';
import { createOutbox, type QueuedTick } from '@/features/workbench/offline/outbox';
import type { TickResponse } from '@/features/workbench/api/postProgress';

const memory = () => {
  let saved: QueuedTick[] = [];
  return { load: async () => [...saved], save: async (items: QueuedTick[]) => void (saved = [...items]), saved: () => saved };
};
const tick = (clientId: string, buildId = 1, revision = 1): QueuedTick => ({ clientId, buildId, revision, kind: 'step', itemKey: 's1', done: true, madeAt: '2026-12-02T08:00:00.000Z' });

describe('tick outbox', () => {
  it('keeps ticks while the server cannot be reached and sends them, grouped by build and revision, when it can', async () => {
    const storage = memory();
    let online = false;
    const sent: [number, number, string[]][] = [];
    const outbox = createOutbox(storage, async (buildId, revision, ticks) => {
      if (!online) throw new ApiError({ status: 0, code: 'network', message: 'offline' });
      sent.push([buildId, revision, ticks.map((t) => t.clientId)]);
      return {} as TickResponse;
    });
    await outbox.add(tick('a-000001'));
    await outbox.add(tick('a-000002', 1, 2));
    const first = await outbox.flush();
    expect(first.offline).toBe(true);
    expect(storage.saved()).toHaveLength(2);

    online = true;
    const second = await outbox.flush();
    expect(second.sent).toBe(2);
    expect(sent).toEqual([[1, 1, ['a-000001']], [1, 2, ['a-000002']]]);
    expect(storage.saved()).toEqual([]);
  });

  it('drops ticks the server refuses for good and says why', async () => {
    const storage = memory();
    const outbox = createOutbox(storage, async () => {
      throw new ApiError({ status: 403, code: 'forbidden', message: 'This build is not assigned to you.' });
    });
    await outbox.add(tick('b-000001'));
    const result = await outbox.flush();
    expect(result.refused.map((item) => item.message)).toEqual(['This build is not assigned to you.']);
    expect(storage.saved()).toEqual([]);
  });
});
