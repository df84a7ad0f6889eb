import { z } from 'zod';

export const analysisBodySchema = z.strictObject(
  { document: z.unknown().refine((value) => value !== undefined, 'Send the design document to analyse') },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys.join(', ')}` : 'Send a JSON object') },
);
