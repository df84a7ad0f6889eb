import { DataTypes, Model, type Sequelize } from 'sequelize';

/** The table connect-session-sequelize reads and writes; its column names are the library's. */
export class SessionModel extends Model {
  declare sid: string;
  declare expires: Date | null;
  declare data: string | null;
}

export function initSessionModel(sequelize: Sequelize): typeof SessionModel {
  // A subclass per database, so two open databases (tests, the CLI) never share a model class.
  const Bound = class extends SessionModel {};
  Bound.init(
    {
      sid: { type: DataTypes.STRING(36), primaryKey: true },
      expires: DataTypes.DATE,
      data: DataTypes.TEXT,
    },
    { sequelize, modelName: 'Session', tableName: 'sessions' },
  );
  return Bound;
}
