import type { Database } from '../../db/database';
import type { UserModel, UserPreferences } from '../../db/models/user';
import { keptReads } from '../../db/keptReads';
import { AppError } from '../../middleware/appError';
import type { Passwords } from './passwords';
import { destroySessionsOfUser } from './sessionRevocation';

export function createAuthService(db: Database, passwords: Passwords) {
  const { User } = db.models;
  const userRows = keptReads<number, UserModel['dataValues'] | null>(db, 10_000);

  return {
    /**
     * The active user with this email and password, or null. Always runs one bcrypt comparison,
     * also for unknown emails, so the answer time does not tell whether an account exists.
     */
    async verifyCredentials(email: string, password: string): Promise<UserModel | null> {
      const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
      const matches = await passwords.verify(password, user?.passwordHash ?? (await passwords.dummyHash()));
      return user && matches && user.active ? user : null;
    },

    /**
     * The signed-in user for a session, or null once the account is gone or deactivated. Every
     * signed-in request asks: the row is kept until the next write, and each call gets an
     * instance of its own built from it, as the query would have built it.
     */
    async findActiveUser(id: number): Promise<UserModel | null> {
      const row = await userRows(id, async () => {
        const user = await User.findByPk(id);
        return user ? { ...user.dataValues } : null;
      });
      if (!row) return null;
      const user = User.build({ ...row }, { isNewRecord: false, raw: true });
      return user.active ? user : null;
    },

    async updateProfile(user: UserModel, changes: { displayName?: string; preferences?: UserPreferences }): Promise<UserModel> {
      return db.write(async (transaction) => {
        const fresh = await User.findByPk(user.id, { transaction, rejectOnEmpty: true });
        if (changes.displayName !== undefined) fresh.displayName = changes.displayName;
        if (changes.preferences !== undefined) {
          const current = typeof fresh.preferences === 'string' ? JSON.parse(fresh.preferences) : fresh.preferences;
          if (current?.units !== changes.preferences.units) fresh.preferences = { ...current, ...changes.preferences };
        }
        if (fresh.changed()) await fresh.save({ transaction });
        return fresh;
      });
    },

    /** Changes the password and signs the user out everywhere else. */
    async changePassword(user: UserModel, currentPassword: string, newPassword: string, currentSessionId: string): Promise<void> {
      const matches = await passwords.verify(currentPassword, user.passwordHash);
      if (!matches) {
        throw new AppError(400, 'wrong_password', 'Your current password is not correct.', {
          fields: { currentPassword: 'This is not your current password' },
        });
      }
      if (currentPassword === newPassword) {
        throw new AppError(400, 'invalid_request', 'Choose a new password that differs from the current one.', {
          fields: { newPassword: 'Choose a password that differs from the current one' },
        });
      }
      const passwordHash = await passwords.hash(newPassword);
      await db.write(async (transaction) => {
        await User.update({ passwordHash }, { where: { id: user.id }, transaction });
        await destroySessionsOfUser(db, user.id, { exceptSessionId: currentSessionId, transaction });
      });
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
