import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/apiClient';
import { reviewKeys, reviewSchema, type Review } from './schemas';

/** One design's review: the latest revision, its comments and decisions. */
export async function getReview(designId: number, signal?: AbortSignal): Promise<Review> {
  return apiFetch(`/api/reviews/${designId}`, { schema: reviewSchema, signal });
}

export const reviewQueryOptions = (designId: number) => queryOptions({ queryKey: reviewKeys.detail(designId), queryFn: ({ signal }) => getReview(designId, signal) });

export function useReview(designId: number) {
  return useQuery(reviewQueryOptions(designId));
}
