import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * Tables of the sharing features: read-only links and classes, customer review (shares, comments,
 * decisions), password resets and uploads. Each init makes a subclass per database, so two open
 * databases (tests, the CLI) never share a model class.
 */

export class ClassModel extends Model<InferAttributes<ClassModel>, InferCreationAttributes<ClassModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare description: CreationOptional<string>;
  declare expiresAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class ShareLinkModel extends Model<InferAttributes<ShareLinkModel>, InferCreationAttributes<ShareLinkModel>> {
  declare id: CreationOptional<number>;
  declare designId: number;
  declare tokenHash: string;
  declare revisionNumber: CreationOptional<number | null>;
  declare label: CreationOptional<string>;
  declare expiresAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare openCount: CreationOptional<number>;
  declare classId: CreationOptional<number | null>;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class DesignShareModel extends Model<InferAttributes<DesignShareModel>, InferCreationAttributes<DesignShareModel>> {
  declare id: CreationOptional<number>;
  declare designId: number;
  declare customerId: number;
  declare invitedBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class ReviewCommentModel extends Model<InferAttributes<ReviewCommentModel>, InferCreationAttributes<ReviewCommentModel>> {
  declare id: CreationOptional<number>;
  declare designId: number;
  declare revisionNumber: number;
  declare partId: CreationOptional<string | null>;
  /** [x, y, z] in mm, design coordinates. */
  declare position: CreationOptional<[number, number, number] | null>;
  declare body: string;
  declare parentId: CreationOptional<number | null>;
  declare authorId: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export const REVIEW_DECISIONS = ['approved', 'changes_requested'] as const;
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];

export class ReviewDecisionModel extends Model<InferAttributes<ReviewDecisionModel>, InferCreationAttributes<ReviewDecisionModel>> {
  declare id: CreationOptional<number>;
  declare designId: number;
  declare revisionNumber: number;
  declare decision: ReviewDecision;
  declare note: CreationOptional<string>;
  declare decidedBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class PasswordResetModel extends Model<InferAttributes<PasswordResetModel>, InferCreationAttributes<PasswordResetModel>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class UploadModel extends Model<InferAttributes<UploadModel>, InferCreationAttributes<UploadModel>> {
  declare id: CreationOptional<number>;
  declare designId: number;
  declare originalName: string;
  declare storedName: string;
  declare mimeType: string;
  declare sizeBytes: number;
  declare hasThumbnail: CreationOptional<boolean>;
  declare uploadedBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };
const options = (sequelize: Sequelize, modelName: string, tableName: string) => ({ sequelize, modelName, tableName, underscored: true });

export function initSharingModels(sequelize: Sequelize) {
  const Class = class extends ClassModel {};
  Class.init(
    {
      id,
      name: { type: DataTypes.STRING(120), allowNull: false },
      description: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      createdBy: { type: DataTypes.INTEGER, allowNull: false },
      ...stamps,
    },
    options(sequelize, 'Class', 'classes'),
  );

  const ShareLink = class extends ShareLinkModel {};
  ShareLink.init(
    {
      id,
      designId: { type: DataTypes.INTEGER, allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      revisionNumber: { type: DataTypes.INTEGER, allowNull: true },
      label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      openCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      classId: { type: DataTypes.INTEGER, allowNull: true },
      createdBy: { type: DataTypes.INTEGER, allowNull: false },
      ...stamps,
    },
    options(sequelize, 'ShareLink', 'share_links'),
  );

  const DesignShare = class extends DesignShareModel {};
  DesignShare.init(
    {
      id,
      designId: { type: DataTypes.INTEGER, allowNull: false },
      customerId: { type: DataTypes.INTEGER, allowNull: false },
      invitedBy: { type: DataTypes.INTEGER, allowNull: false },
      ...stamps,
    },
    options(sequelize, 'DesignShare', 'design_shares'),
  );

  const ReviewComment = class extends ReviewCommentModel {};
  ReviewComment.init(
    {
      id,
      designId: { type: DataTypes.INTEGER, allowNull: false },
      revisionNumber: { type: DataTypes.INTEGER, allowNull: false },
      partId: { type: DataTypes.STRING(64), allowNull: true },
      position: { type: DataTypes.JSON, allowNull: true },
      body: { type: DataTypes.STRING(2000), allowNull: false },
      parentId: { type: DataTypes.INTEGER, allowNull: true },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      ...stamps,
    },
    options(sequelize, 'ReviewComment', 'review_comments'),
  );

  const ReviewDecisionRow = class extends ReviewDecisionModel {};
  ReviewDecisionRow.init(
    {
      id,
      designId: { type: DataTypes.INTEGER, allowNull: false },
      revisionNumber: { type: DataTypes.INTEGER, allowNull: false },
      decision: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [[...REVIEW_DECISIONS]] } },
      note: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
      decidedBy: { type: DataTypes.INTEGER, allowNull: false },
      ...stamps,
    },
    options(sequelize, 'ReviewDecision', 'review_decisions'),
  );

  const PasswordReset = class extends PasswordResetModel {};
  PasswordReset.init(
    {
      id,
      userId: { type: DataTypes.INTEGER, allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    options(sequelize, 'PasswordReset', 'password_resets'),
  );

  const Upload = class extends UploadModel {};
  Upload.init(
    {
      id,
      designId: { type: DataTypes.INTEGER, allowNull: false },
      originalName: { type: DataTypes.STRING(200), allowNull: false },
      storedName: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      mimeType: { type: DataTypes.STRING(100), allowNull: false },
      sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
      hasThumbnail: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      uploadedBy: { type: DataTypes.INTEGER, allowNull: false },
      ...stamps,
    },
    options(sequelize, 'Upload', 'uploads'),
  );

  return { Class, ShareLink, DesignShare, ReviewComment, ReviewDecision: ReviewDecisionRow, PasswordReset, Upload };
}
