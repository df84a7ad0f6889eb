import type { z } from 'zod';

/** Turns zod issues into `fields` (dotted path → message) and one summary sentence. */
export function describeZodIssues(
  issues: readonly z.core.$ZodIssue[],
  prefix = '',
): { fields: Record<string, string>; message: string } {
  const fields: Record<string, string> = {};
  for (const issue of issues) {
    const path = [prefix, ...issue.path.map(String)].filter(Boolean).join('.');
    const key = path || '(body)';
    if (!(key in fields)) fields[key] = issue.message;
  }
  const entries = Object.entries(fields);
  const [firstKey, firstMessage] = entries[0] ?? ['(body)', 'The request was not understood'];
  const first = firstKey === '(body)' ? firstMessage : `${firstKey}: ${firstMessage}`;
  const message =
    entries.length <= 1 ? `Please correct this: ${first}.` : `Please correct ${entries.length} fields, starting with ${first}.`;
  return { fields, message };
}
