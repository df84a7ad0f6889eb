import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

export const up: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.createTable('design_shares', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    design_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' }, onDelete: 'CASCADE' },
    customer_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    invited_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('design_shares', ['design_id', 'customer_id'], { unique: true, name: 'design_shares_design_customer' });
  await queryInterface.addIndex('design_shares', ['customer_id'], { name: 'design_shares_customer' });

  await queryInterface.createTable('review_comments', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    design_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' }, onDelete: 'CASCADE' },
    revision_number: { type: DataTypes.INTEGER, allowNull: false },
    part_id: { type: DataTypes.STRING(64), allowNull: true },
    /** [x, y, z] in mm, design coordinates; null for a comment on the whole design. */
    position: { type: DataTypes.JSON, allowNull: true },
    body: { type: DataTypes.STRING(2000), allowNull: false },
    parent_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'review_comments', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('review_comments', ['design_id', 'revision_number'], { name: 'review_comments_design' });

  await queryInterface.createTable('review_decisions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    design_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' }, onDelete: 'CASCADE' },
    revision_number: { type: DataTypes.INTEGER, allowNull: false },
    /** 'approved' or 'changes_requested'. */
    decision: { type: DataTypes.STRING(20), allowNull: false },
    note: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
    decided_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('review_decisions', ['design_id', 'revision_number'], { name: 'review_decisions_design' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('review_decisions');
  await queryInterface.dropTable('review_comments');
  await queryInterface.dropTable('design_shares');
};
