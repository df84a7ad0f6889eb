import type { UserModel } from '../db/models/user';

declare global {
  namespace Express {
    // The signed-in user, loaded fresh from the database on every request by passport.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends UserModel {}
  }
}

export {};
