import { z } from 'zod';
import { SYSTEM_IDS, type SystemId } from '../catalogue/types';

/** A profile system id, from the catalogue's list. */
export const systemIdSchema = z.enum(SYSTEM_IDS, { error: `Choose a profile system: ${SYSTEM_IDS.join(', ')}` });
export type { SystemId };
