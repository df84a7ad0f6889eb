import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

export const up: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.createTable('uploads', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    design_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'designs', key: 'id' }, onDelete: 'CASCADE' },
    /** The name the person gave the file (shown, never used as a path). */
    original_name: { type: DataTypes.STRING(200), allowNull: false },
    /** Random file name inside the uploads folder. */
    stored_name: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    mime_type: { type: DataTypes.STRING(100), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER, allowNull: false },
    has_thumbnail: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    uploaded_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('uploads', ['design_id'], { name: 'uploads_design' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('uploads');
};
