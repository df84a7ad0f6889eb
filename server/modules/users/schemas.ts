import { z } from 'zod';
import { ROLES } from '../../../src/domain/contracts';

export const emailSchema = z
  .string({ error: 'Enter an email address' })
  .trim()
  .toLowerCase()
  .min(1, 'Enter an email address')
  .max(254, 'An email address is at most 254 characters')
  .pipe(z.email({ error: 'Enter an email address like name@example.com' }));

export const displayNameSchema = z
  .string({ error: 'Enter a name' })
  .trim()
  .min(1, 'Enter a name')
  .max(80, 'A name is at most 80 characters');

/** bcrypt reads only the first 72 bytes, so longer passwords are refused rather than silently cut. */
export const newPasswordSchema = z
  .string({ error: 'Enter a password' })
  .min(10, 'Use at least 10 characters')
  .refine((password) => Buffer.byteLength(password, 'utf8') <= 72, 'Use at most 72 bytes (about 72 plain letters)');

export const roleSchema = z.enum(ROLES, { error: `Choose one of: ${ROLES.join(', ')}` });

export const userIdParamsSchema = z.object({
  id: z.string({ error: 'A user id is a whole number' }).regex(/^[1-9]\d{0,14}$/, 'A user id is a whole number').transform(Number),
});

export const createUserBodySchema = z.strictObject(
  {
    email: emailSchema,
    displayName: displayNameSchema,
    role: roleSchema,
    password: newPasswordSchema,
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys.join(', ')}` : 'Send a JSON object') },
);

export const patchUserBodySchema = z.strictObject(
  {
    displayName: displayNameSchema.optional(),
    role: roleSchema.optional(),
    active: z.boolean({ error: 'Use true or false' }).optional(),
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys.join(', ')}` : 'Send a JSON object') },
);
