import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

import { ROLES, type LengthUnit, type Role, type UserPreferences } from '../../../src/domain/contracts';

export { ROLES, type Role, type UserPreferences };
export type Units = LengthUnit;

export class UserModel extends Model<InferAttributes<UserModel>, InferCreationAttributes<UserModel>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare displayName: string;
  declare role: Role;
  declare passwordHash: string;
  declare active: CreationOptional<boolean>;
  declare preferences: CreationOptional<UserPreferences>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initUserModel(sequelize: Sequelize): typeof UserModel {
  // A subclass per database, so two open databases (tests, the CLI) never share a model class.
  const Bound = class extends UserModel {};
  Bound.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      displayName: { type: DataTypes.STRING(80), allowNull: false },
      role: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [[...ROLES]] } },
      passwordHash: { type: DataTypes.STRING(100), allowNull: false },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      preferences: { type: DataTypes.JSON, allowNull: false, defaultValue: { units: 'mm' } },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'User', tableName: 'users', underscored: true },
  );
  return Bound;
}
