import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

/** Builds: one design revision assigned to builders, its people and every state change. */
export const up: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.createTable('builds', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    design_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' }, onDelete: 'RESTRICT' },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    state: { type: DataTypes.STRING(20), allowNull: false },
    due_date: { type: DataTypes.DATEONLY, allowNull: true },
    note: { type: DataTypes.STRING(1000), allowNull: true },
    created_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('builds', ['design_id'], { name: 'builds_design' });

  await queryInterface.createTable('build_assignees', {
    build_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    assigned_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    assigned_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('build_assignees', ['user_id'], { name: 'build_assignees_user' });

  await queryInterface.createTable('build_state_changes', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    build_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    from_state: { type: DataTypes.STRING(20), allowNull: true },
    to_state: { type: DataTypes.STRING(20), allowNull: false },
    changed_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    changed_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('build_state_changes', ['build_id', 'changed_at'], { name: 'build_state_changes_build' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('build_state_changes');
  await queryInterface.dropTable('build_assignees');
  await queryInterface.dropTable('builds');
};
