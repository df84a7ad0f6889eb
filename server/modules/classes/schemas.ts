import { z } from 'zod';
import { positiveWhole } from '../designs/schemas';
import { futureDate } from '../links/schemas';

const className = z.string({ error: 'Enter a name for the class' }).trim().min(1, 'Enter a name for the class').max(120, 'A class name is at most 120 characters');
const description = z.string({ error: 'A description is text' }).trim().max(1000, 'A description is at most 1,000 characters');

export const createClassBodySchema = z.strictObject({
  name: className,
  description: description.optional(),
  expiresAt: futureDate.nullable().optional(),
});

export const patchClassBodySchema = z.strictObject({
  name: className.optional(),
  description: description.optional(),
  expiresAt: futureDate.nullable().optional(),
});

export const classIdParamsSchema = z.object({ id: positiveWhole('A class id') });
