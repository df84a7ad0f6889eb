import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '@/lib/apiClient';

const createdLinkSchema = z.object({ token: z.string(), url: z.string(), link: z.object({ id: z.number(), expiresAt: z.string().nullable() }) });

export interface NewLinkInput {
  designId: number;
  revision?: number | null;
  label?: string;
  expiresAt?: string | null;
  email?: string;
}

/** A read-only link to a design; the address is shown once. */
export async function createLink(input: NewLinkInput) {
  return apiFetch('/api/links', { method: 'POST', body: input, schema: createdLinkSchema });
}

export function useCreateLink() {
  return useMutation({ mutationFn: createLink });
}
