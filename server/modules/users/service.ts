import { UniqueConstraintError } from 'sequelize';
import type { Database } from '../../db/database';
import type { Role, UserModel } from '../../db/models/user';
import { AppError, notFound } from '../../middleware/appError';
import type { Passwords } from '../auth/passwords';
import { destroySessionsOfUser } from '../auth/sessionRevocation';

const emailTaken = () =>
  new AppError(409, 'email_taken', 'An account with that email address already exists.', {
    fields: { email: 'An account with this email address already exists' },
  });

export function createUsersService(db: Database, passwords: Passwords) {
  const { User } = db.models;

  return {
    list: () => User.findAll({ order: [['id', 'ASC']] }),

    async create(input: { email: string; displayName: string; role: Role; password: string }): Promise<UserModel> {
      const passwordHash = await passwords.hash(input.password);
      try {
        return await db.write(async (transaction) => {
          const existing = await User.findOne({ where: { email: input.email }, transaction });
          if (existing) throw emailTaken();
          return User.create(
            { email: input.email, displayName: input.displayName, role: input.role, passwordHash, preferences: { units: 'mm' } },
            { transaction },
          );
        });
      } catch (error) {
        if (error instanceof UniqueConstraintError) throw emailTaken();
        throw error;
      }
    },

    async update(actor: UserModel, id: number, changes: { displayName?: string; role?: Role; active?: boolean }): Promise<UserModel> {
      if (actor.id === id) {
        if (changes.role !== undefined && changes.role !== actor.role) {
          throw new AppError(400, 'cannot_change_self', 'You cannot change your own role. Ask another owner to do it.', {
            fields: { role: 'You cannot change your own role' },
          });
        }
        if (changes.active === false) {
          throw new AppError(400, 'cannot_change_self', 'You cannot deactivate your own account. Ask another owner to do it.', {
            fields: { active: 'You cannot deactivate your own account' },
          });
        }
      }
      return db.write(async (transaction) => {
        const user = await User.findByPk(id, { transaction });
        if (!user) throw notFound('That user');
        if (changes.displayName !== undefined) user.displayName = changes.displayName;
        if (changes.role !== undefined) user.role = changes.role;
        if (changes.active !== undefined) user.active = changes.active;
        if (user.changed()) await user.save({ transaction });
        if (changes.active === false) await destroySessionsOfUser(db, user.id, { transaction });
        return user;
      });
    },
  };
}

export type UsersService = ReturnType<typeof createUsersService>;
