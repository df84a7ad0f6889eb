import { Op } from 'sequelize';
import type { Database } from '../../db/database';
import type { UserModel } from '../../db/models/user';
import { AppError } from '../../middleware/appError';
import type { Mailer } from '../mail/mailService';
import { passwordResetMail } from '../mail/messages';
import { hashToken, newToken } from '../links/tokens';
import type { Passwords } from './passwords';
import { destroySessionsOfUser } from './sessionRevocation';

export const RESET_VALID_MINUTES = 60;
/** An invitation's "choose your password" link lives longer than a reset. */
export const INVITATION_VALID_DAYS = 7;

export const resetPagePath = (token: string) => `/reset-password?token=${token}`;

export const INVALID_RESET_MESSAGE = 'This reset link does not work: it was already used, has expired, or was mistyped. Ask for a new one.';

/** One-time e-mailed tokens to choose a new password; only their hashes are stored. */
export function createPasswordResets(db: Database, passwords: Passwords, mailer: Mailer) {
  const { User, PasswordReset } = db.models;

  async function issue(user: UserModel, validMs: number): Promise<string> {
    const { token, hash } = newToken();
    await db.write((transaction) => PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + validMs) }, { transaction }));
    return token;
  }

  return {
    /** A token for a user (used by invitations); `validMs` from now. */
    issue,

    /**
     * Sends a reset link when an active account has this email. Returns nothing either way, so
     * the answer cannot tell whether the account exists; unknown emails cost a similar hash write.
     */
    async request(email: string, baseUrl: string): Promise<void> {
      const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
      if (!user || !user.active) {
        hashToken(newToken().token);
        return;
      }
      const token = await issue(user, RESET_VALID_MINUTES * 60_000);
      // Not awaited: the answer must not wait for the mail server, or its time would tell the account exists.
      void mailer.send(passwordResetMail({ to: user.email, name: user.displayName, resetUrl: `${baseUrl}${resetPagePath(token)}`, validMinutes: RESET_VALID_MINUTES }));
    },

    /** Sets the new password if the token is unused and unexpired; ends the user's sessions. */
    async confirm(token: string, newPassword: string): Promise<void> {
      const hash = hashToken(token);
      const passwordHash = await passwords.hash(newPassword);
      await db.write(async (transaction) => {
        const reset = await PasswordReset.findOne({ where: { tokenHash: hash, usedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction });
        const user = reset ? await User.findByPk(reset.userId, { transaction }) : null;
        if (!reset || !user || !user.active) throw new AppError(400, 'invalid_token', INVALID_RESET_MESSAGE, { fields: { token: 'This link does not work any more' } });
        reset.usedAt = new Date();
        await reset.save({ transaction });
        // Any other outstanding reset links of this user stop working too.
        await PasswordReset.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null }, transaction });
        user.passwordHash = passwordHash;
        await user.save({ transaction });
        await destroySessionsOfUser(db, user.id, { transaction });
      });
    },
  };
}

export type PasswordResets = ReturnType<typeof createPasswordResets>;
