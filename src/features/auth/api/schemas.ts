import { z } from 'zod';

export const roleSchema = z.enum(['owner', 'designer', 'builder', 'customer', 'instructor']);
export type Role = z.infer<typeof roleSchema>;

export const unitsSchema = z.enum(['mm', 'in']);
export type Units = z.infer<typeof unitsSchema>;

export const userSchema = z.object({
  id: z.number(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  active: z.boolean(),
  preferences: z.object({ units: unitsSchema }),
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const userResponseSchema = z.object({ user: userSchema });
