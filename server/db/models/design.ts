import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class DesignModel extends Model<InferAttributes<DesignModel>, InferCreationAttributes<DesignModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare systemId: string;
  declare createdBy: number;
  /** Set when the design is deleted; archived designs are hidden but their revisions are kept. */
  declare archivedAt: CreationOptional<Date | null>;
  declare latestRevision: number;
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
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Design', tableName: 'designs', underscored: true },
  );
  return Bound;
}
