import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

export const up: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.createTable('classes', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    description: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('classes', ['created_by'], { name: 'classes_created_by' });

  await queryInterface.createTable('share_links', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    design_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' }, onDelete: 'CASCADE' },
    /** SHA-256 of the token, hex; the token itself is shown once and never stored. */
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    /** A pinned revision number, or null to follow the latest. */
    revision_number: { type: DataTypes.INTEGER, allowNull: true },
    label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    open_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    class_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'classes', key: 'id' }, onDelete: 'CASCADE' },
    created_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('share_links', ['design_id'], { name: 'share_links_design' });
  await queryInterface.addIndex('share_links', ['class_id'], { name: 'share_links_class' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('share_links');
  await queryInterface.dropTable('classes');
};
