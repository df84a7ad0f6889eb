import { z } from 'zod';
import { lengthUnitSchema } from '../../../src/domain/contracts';
import { displayNameSchema, newPasswordSchema } from '../users/schemas';

const objectError = { error: (issue: { code: string; keys?: string[] }) => (issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys?.join(', ')}` : 'Send a JSON object') };

export const signInBodySchema = z.object(
  {
    email: z.string({ error: 'Enter your email address' }).trim().toLowerCase().min(1, 'Enter your email address').max(254, 'An email address is at most 254 characters'),
    password: z.string({ error: 'Enter your password' }).min(1, 'Enter your password').max(1000, 'That password is too long'),
  },
  objectError,
);

export const patchMeBodySchema = z.strictObject(
  {
    displayName: displayNameSchema.optional(),
    preferences: z
      .strictObject({ units: lengthUnitSchema }, objectError)
      .optional(),
  },
  objectError,
);

export const changePasswordBodySchema = z.strictObject(
  {
    currentPassword: z.string({ error: 'Enter your current password' }).min(1, 'Enter your current password').max(1000, 'That password is too long'),
    newPassword: newPasswordSchema,
  },
  objectError,
);

export const passwordResetRequestBodySchema = z.strictObject(
  {
    email: z.string({ error: 'Enter your email address' }).trim().toLowerCase().min(1, 'Enter your email address').max(254, 'An email address is at most 254 characters'),
  },
  objectError,
);

export const passwordResetConfirmBodySchema = z.strictObject(
  {
    token: z.string({ error: 'The reset link is incomplete' }).min(1, 'The reset link is incomplete').max(200, 'The reset link is not valid'),
    newPassword: newPasswordSchema,
  },
  objectError,
);
