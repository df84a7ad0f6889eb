import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { reviewKeys, sharedDesignSchema, type SharedDesignSummary } from './schemas';

/** The designs shared with the signed-in customer. */
export async function listReviews(signal?: AbortSignal): Promise<SharedDesignSummary[]> {
  return (await apiFetch('/api/reviews', { schema: z.object({ designs: z.array(sharedDesignSchema) }), signal })).designs;
}

export const reviewsQueryOptions = () => queryOptions({ queryKey: reviewKeys.list(), queryFn: ({ signal }) => listReviews(signal) });

export function useReviews() {
  return useQuery(reviewsQueryOptions());
}
