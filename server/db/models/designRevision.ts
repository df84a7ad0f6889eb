import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One saved state of a design. Revisions are never changed after they are written. */
export class DesignRevisionModel extends Model<InferAttributes<DesignRevisionModel>, InferCreationAttributes<DesignRevisionModel>> {
  declare id: CreationOptional<number>;
  declare designId: number;
  declare number: number;
  /** The design document as JSON text (kept as text so lists need not parse it). */
  declare document: string;
  declare thumbnail: CreationOptional<Buffer | null>;
  declare message: CreationOptional<string | null>;
  declare createdBy: number;
  /** Counted from the document when it is saved (the list reads these, not the document). */
  declare profileCount: CreationOptional<number>;
  declare jointCount: CreationOptional<number>;
  declare panelCount: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
}

export function initDesignRevisionModel(sequelize: Sequelize): typeof DesignRevisionModel {
  // A subclass per database, so two open databases (tests, the CLI) never share a model class.
  const Bound = class extends DesignRevisionModel {};
  Bound.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      designId: { type: DataTypes.INTEGER, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      document: { type: DataTypes.TEXT, allowNull: false },
      thumbnail: { type: DataTypes.BLOB, allowNull: true },
      message: { type: DataTypes.STRING(500), allowNull: true },
      createdBy: { type: DataTypes.INTEGER, allowNull: false },
      profileCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      jointCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      panelCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'DesignRevision', tableName: 'design_revisions', underscored: true, updatedAt: false },
  );
  return Bound;
}
