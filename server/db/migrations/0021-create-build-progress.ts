import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

/**
 * Progress records: append-only ticks (and unticks) of cut pieces, kit lines and steps, each kept
 * with the revision it was made on. Two builders ticking the same step leave two rows.
 * `client_id` is the ticking device's id for the record, so a re-sent offline queue is stored once.
 */
export const up: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.createTable('build_progress', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    build_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(10), allowNull: false },
    item_key: { type: DataTypes.STRING(200), allowNull: false },
    done: { type: DataTypes.BOOLEAN, allowNull: false },
    client_id: { type: DataTypes.STRING(64), allowNull: false },
    made_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    made_at: { type: DataTypes.DATE, allowNull: false },
    recorded_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('build_progress', ['build_id', 'revision'], { name: 'build_progress_build_revision' });
  await queryInterface.addIndex('build_progress', ['build_id', 'client_id'], { unique: true, name: 'build_progress_client' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('build_progress');
};
