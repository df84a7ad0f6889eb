import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export const BUILD_STATES = ['planned', 'cutting', 'assembling', 'done', 'on-hold'] as const;
export type BuildState = (typeof BUILD_STATES)[number];
export const PROGRESS_KINDS = ['cut', 'kit', 'step'] as const;
export type ProgressKind = (typeof PROGRESS_KINDS)[number];

/** One design revision to be built by the assigned builders. */
export class BuildModel extends Model<InferAttributes<BuildModel>, InferCreationAttributes<BuildModel>> {
  declare id: CreationOptional<number>;
  declare designId: number;
  declare revision: number;
  declare state: BuildState;
  /** YYYY-MM-DD, the shop's calendar day. */
  declare dueDate: string | null;
  declare note: string | null;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class BuildAssigneeModel extends Model<InferAttributes<BuildAssigneeModel>, InferCreationAttributes<BuildAssigneeModel>> {
  declare buildId: number;
  declare userId: number;
  declare assignedBy: number;
  declare assignedAt: Date;
}

export class BuildStateChangeModel extends Model<InferAttributes<BuildStateChangeModel>, InferCreationAttributes<BuildStateChangeModel>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare fromState: BuildState | null;
  declare toState: BuildState;
  declare changedBy: number;
  declare changedAt: Date;
}

export class BuildProgressModel extends Model<InferAttributes<BuildProgressModel>, InferCreationAttributes<BuildProgressModel>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare revision: number;
  declare kind: ProgressKind;
  declare itemKey: string;
  declare done: boolean;
  declare clientId: string;
  declare madeBy: number;
  /** When the builder ticked (the device's clock, so offline ticks keep their time). */
  declare madeAt: Date;
  /** When the server stored it. */
  declare recordedAt: Date;
}

export function initBuildModels(sequelize: Sequelize) {
  // Subclasses per database, so two open databases (tests, the CLI) never share a model class.
  const Build = class extends BuildModel {};
  Build.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      designId: { type: DataTypes.INTEGER, allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      state: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [[...BUILD_STATES]] } },
      dueDate: { type: DataTypes.DATEONLY, allowNull: true },
      note: { type: DataTypes.STRING(1000), allowNull: true },
      createdBy: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Build', tableName: 'builds', underscored: true },
  );
  const BuildAssignee = class extends BuildAssigneeModel {};
  BuildAssignee.init(
    {
      buildId: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
      userId: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
      assignedBy: { type: DataTypes.INTEGER, allowNull: false },
      assignedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, modelName: 'BuildAssignee', tableName: 'build_assignees', underscored: true, timestamps: false },
  );
  const BuildStateChange = class extends BuildStateChangeModel {};
  BuildStateChange.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      buildId: { type: DataTypes.INTEGER, allowNull: false },
      fromState: { type: DataTypes.STRING(20), allowNull: true },
      toState: { type: DataTypes.STRING(20), allowNull: false },
      changedBy: { type: DataTypes.INTEGER, allowNull: false },
      changedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, modelName: 'BuildStateChange', tableName: 'build_state_changes', underscored: true, timestamps: false },
  );
  const BuildProgress = class extends BuildProgressModel {};
  BuildProgress.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      buildId: { type: DataTypes.INTEGER, allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      kind: { type: DataTypes.STRING(10), allowNull: false, validate: { isIn: [[...PROGRESS_KINDS]] } },
      itemKey: { type: DataTypes.STRING(200), allowNull: false },
      done: { type: DataTypes.BOOLEAN, allowNull: false },
      clientId: { type: DataTypes.STRING(64), allowNull: false },
      madeBy: { type: DataTypes.INTEGER, allowNull: false },
      madeAt: { type: DataTypes.DATE, allowNull: false },
      recordedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, modelName: 'BuildProgress', tableName: 'build_progress', underscored: true, timestamps: false },
  );
  return { Build, BuildAssignee, BuildStateChange, BuildProgress };
}
