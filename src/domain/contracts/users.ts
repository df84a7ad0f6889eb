import { z } from 'zod';
import { roleSchema } from './roles';
import { lengthUnitSchema } from './units';

/** A person's saved preferences. */
export const userPreferencesSchema = z.object({ units: lengthUnitSchema });
export type UserPreferences = z.infer<typeof userPreferencesSchema>;

/** The User of the HTTP contract (never the password hash). Dates are ISO 8601 text. */
export const userSchema = z.object({
  id: z.number(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  active: z.boolean(),
  preferences: userPreferencesSchema,
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const userResponseSchema = z.object({ user: userSchema });
export type UserResponse = z.infer<typeof userResponseSchema>;
/** `GET /api/auth/me`: the signed-in user, or null for an anonymous visitor. */
export const currentUserResponseSchema = z.object({ user: userSchema.nullable() });
export type CurrentUserResponse = z.infer<typeof currentUserResponseSchema>;
export const usersResponseSchema = z.object({ users: z.array(userSchema) });
export type UsersResponse = z.infer<typeof usersResponseSchema>;
