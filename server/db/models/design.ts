import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class DesignModel extends Model<InferAttributes<DesignModel>, InferCreationAttributes<DesignModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare systemId: string;
  declare createdBy: number;
  /** Set when the design is deleted; archived designs are hidden but their revisions are kept. */
  declare archivedAt: CreationOptional<Date | null>;
  declare latestRevision: number;
  /** The latest revision's profile count, author and thumbnail flag, so the list reads this row only. */
  declare profileCount: CreationOptional<number>;
  declare hasThumbnail: CreationOptional<boolean>;
  declare updatedBy: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initDesignModel(sequelize: Sequelize): typeof DesignModel {
  // A subclass per database, so two open databases (tests, the CLI) never share a model class.
  const Bound = class extends DesignModel {};
  Bound.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      systemId: { type: DataTypes.STRING(64), allowNull: false },
      createdBy: { type: DataTypes.INTEGER, allowNull: false },
      archivedAt: { type: DataTypes.DATE, allowNull: true },
      latestRevision: { type: DataTypes.INTEGER, allowNull: false },
      profileCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      hasThumbnail: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      updatedBy: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Design', tableName: 'designs', underscored: true },
  );
  return Bound;
}
