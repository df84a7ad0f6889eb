import { roleSchema } from '@/domain/contracts';
import { ROLE_LABELS } from '@/lib/session/roles';

export const ROLE_OPTIONS = roleSchema.options.map((role) => ({ value: role, label: ROLE_LABELS[role] }));
