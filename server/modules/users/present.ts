import type { User } from '../../../src/domain/contracts';
import type { UserModel } from '../../db/models/user';

/** The User shape of the HTTP contract (`src/domain/contracts/users.ts`). Never includes the password hash. */
export type UserJson = User;

export function presentUser(user: UserModel): UserJson {
  const preferences = typeof user.preferences === 'string' ? JSON.parse(user.preferences) : user.preferences;
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    active: Boolean(user.active),
    preferences: { units: preferences?.units === 'in' ? 'in' : 'mm' },
    createdAt: new Date(user.createdAt).toISOString(),
  };
}
