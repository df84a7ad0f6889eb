import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

export const up: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.createTable('designs', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    system_id: { type: DataTypes.STRING(64), allowNull: false },
    created_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    latest_revision: { type: DataTypes.INTEGER, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('designs', ['archived_at', 'updated_at'], { name: 'designs_listing' });

  await queryInterface.createTable('design_revisions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    design_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' }, onDelete: 'CASCADE' },
    number: { type: DataTypes.INTEGER, allowNull: false },
    document: { type: DataTypes.TEXT, allowNull: false },
    thumbnail: { type: DataTypes.BLOB, allowNull: true },
    message: { type: DataTypes.STRING(500), allowNull: true },
    created_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('design_revisions', ['design_id', 'number'], { unique: true, name: 'design_revisions_design_number' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('design_revisions');
  await queryInterface.dropTable('designs');
};
