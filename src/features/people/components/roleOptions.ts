import { roleSchema } from '@/features/auth/api/schemas';
import { ROLE_LABELS } from '@/features/auth/roles';

export const ROLE_OPTIONS = roleSchema.options.map((role) => ({ value: role, label: ROLE_LABELS[role] }));
