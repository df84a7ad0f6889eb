import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';
import { uploadSchema, type Upload } from './sharingSchemas';
import { designKeys } from '@/lib/queryKeys';

export async function listUploads(designId: number, signal?: AbortSignal): Promise<Upload[]> {
  return (await apiFetch(`/api/designs/${designId}/uploads`, { schema: z.object({ uploads: z.array(uploadSchema) }), signal })).uploads;
}

export const uploadsQueryOptions = (designId: number) => queryOptions({ queryKey: designKeys.uploads(designId), queryFn: ({ signal }) => listUploads(designId, signal) });

export function useUploads(designId: number) {
  return useQuery(uploadsQueryOptions(designId));
}
