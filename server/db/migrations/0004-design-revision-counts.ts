import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

const COUNTS = ['profile_count', 'joint_count', 'panel_count'] as const;
const LISTS: Record<(typeof COUNTS)[number], string> = { profile_count: 'profiles', joint_count: 'joints', panel_count: 'panels' };
const BATCH = 200;

/**
 * Part counts stored beside each revision at save time, so the designs list never parses
 * documents. Existing revisions are counted here, a batch at a time.
 */
export const up: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  for (const column of COUNTS) {
    await queryInterface.addColumn('design_revisions', column, { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  }
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
};

export const down: MigrationFn<QueryInterface> = async ({ context: queryInterface }) => {
  for (const column of COUNTS) await queryInterface.removeColumn('design_revisions', column);
};
