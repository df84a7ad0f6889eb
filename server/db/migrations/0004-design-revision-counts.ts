import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

const COUNTS = ['profile_count', 'joint_count', 'panel_count'] as const;
const LISTS: Record<(typeof COUNTS)[number], string> = { profile_count: 'profiles', joint_count: 'joints', panel_count: 'panels' };
const BATCH = 200;

/**
 * Part counts stored beside each revision at save time, so the designs list never parses
 * documents. Existing revisions are counted here, a batch at a time. The design row also keeps
 * its latest revision's profile count, author and whether it has a thumbnail: the list then never
 * reads a revision row, whose later columns sit behind the document's overflow pages.
 */
export const up: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  for (const column of COUNTS) {
    await queryInterface.addColumn('design_revisions', column, { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  }
  await queryInterface.addColumn('designs', 'profile_count', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  await queryInterface.addColumn('designs', 'has_thumbnail', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  await queryInterface.addColumn('designs', 'updated_by', { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' });
  const sequelize = queryInterface.sequelize;
  for (let lastId = 0; ; ) {
    const rows = await sequelize.query<{ id: number; document: string }>(
      'SELECT id, document FROM design_revisions WHERE id > :lastId ORDER BY id LIMIT :limit',
      { replacements: { lastId, limit: BATCH }, type: QueryTypes.SELECT },
    );
    if (rows.length === 0) break;
    for (const row of rows) {
      let document: Record<string, unknown> = {};
      try {
        document = JSON.parse(row.document) as Record<string, unknown>;
      } catch {
        // An unreadable document counts as empty; the revision itself is kept as it is.
      }
      const values = Object.fromEntries(COUNTS.map((column) => [column, Array.isArray(document[LISTS[column]]) ? (document[LISTS[column]] as unknown[]).length : 0]));
      await queryInterface.bulkUpdate('design_revisions', values, { id: row.id });
    }
    lastId = rows[rows.length - 1].id;
  }
  const latest = await sequelize.query<{ designId: number; profileCount: number; createdBy: number; hasThumbnail: number }>(
    `SELECT r.design_id AS designId, r.profile_count AS profileCount, r.created_by AS createdBy,
            CASE WHEN r.thumbnail IS NULL THEN 0 ELSE 1 END AS hasThumbnail
       FROM design_revisions r JOIN designs d ON d.id = r.design_id AND r.number = d.latest_revision`,
    { type: QueryTypes.SELECT },
  );
  for (const row of latest) {
    await queryInterface.bulkUpdate('designs', { profile_count: row.profileCount, updated_by: row.createdBy, has_thumbnail: Boolean(row.hasThumbnail) }, { id: row.designId });
  }
};

export const down: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  for (const column of COUNTS) await queryInterface.removeColumn('design_revisions', column);
  for (const column of ['profile_count', 'has_thumbnail', 'updated_by']) await queryInterface.removeColumn('designs', column);
};
