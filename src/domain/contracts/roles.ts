import { z } from 'zod';

/** The one list of roles a Slotwise account can have (server model, API and client read it here). */
export const ROLES = ['owner', 'designer', 'builder', 'customer', 'instructor'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;
