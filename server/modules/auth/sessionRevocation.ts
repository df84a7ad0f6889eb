import { QueryTypes, type Transaction } from 'sequelize';
import type { Database } from '../../db/database';

/**
 * Ends a user's stored sessions (all but `exceptSessionId`), e.g. after deactivation or a password
 * change. passport also refuses inactive users on every request; this removes the rows as well.
 */
export async function destroySessionsOfUser(
  db: Database,
  userId: number,
  options: { exceptSessionId?: string; transaction?: Transaction } = {},
): Promise<void> {
  await db.sequelize.query(
    `DELETE FROM sessions
      WHERE CASE WHEN json_valid(data) THEN json_extract(data, '$.passport.user') END = :userId
        AND sid <> :except`,
    {
      replacements: { userId, except: options.exceptSessionId ?? '' },
      type: QueryTypes.DELETE,
      transaction: options.transaction,
    },
  );
}
