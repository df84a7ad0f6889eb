import { apiFetch } from '@/lib/apiClient';
import { tickResponseSchema, type ProgressKind } from '@/domain/contracts/builds';
import type { z } from 'zod';

export interface TickInput {
  clientId: string;
  kind: ProgressKind;
  itemKey: string;
  done: boolean;
  madeAt: string;
}

export type TickResponse = z.infer<typeof tickResponseSchema>;

/** POST /api/builds/:id/progress — stores ticks made on `revision` (the offline outbox calls it). */
export async function postProgress(buildId: number, revision: number, ticks: TickInput[]): Promise<TickResponse> {
  return apiFetch(`/api/builds/${buildId}/progress`, { method: 'POST', body: { revision, ticks }, schema: tickResponseSchema });
}
