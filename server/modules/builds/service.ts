import { Op, QueryTypes } from 'sequelize';
import type { BuildDetail, BuildNotice, BuildState, BuildSummary, ProgressRecord, StateChange } from '../../../src/domain/contracts/builds';
import type { Database } from '../../db/database';
import { sqliteDateToIso } from '../../db/dates';
import type { BuildModel } from '../../db/models/build';
import type { UserModel } from '../../db/models/user';
import { AppError, notFound } from '../../middleware/appError';
import type { CreateBuildBody, PatchBuildBody, TickBody } from './schemas';

interface BuildRow {
  id: number;
  designId: number;
  designName: string;
  revision: number;
  latestDesignRevision: number;
  state: BuildState;
  dueDate: string | null;
  note: string | null;
  createdById: number;
  createdByName: string;
  createdAt: string;
  updatedAt: string;
}

const BUILD_SELECT = `
  SELECT b.id AS id, b.design_id AS designId, d.name AS designName, b.revision AS revision,
         d.latest_revision AS latestDesignRevision, b.state AS state, b.due_date AS dueDate, b.note AS note,
         u.id AS createdById, u.display_name AS createdByName, b.created_at AS createdAt, b.updated_at AS updatedAt
    FROM builds b
    JOIN designs d ON d.id = b.design_id
    JOIN users u ON u.id = b.created_by`;

const STATE_ORDER: Record<BuildState, number> = { planned: 0, cutting: 1, assembling: 2, done: 3, 'on-hold': 4 };

const isStaff = (user: UserModel) => user.role === 'owner' || user.role === 'designer';

/** The latest record per (kind, item) decides whether it is done; every record is kept. */
export function doneItems(records: Pick<ProgressRecord, 'kind' | 'itemKey' | 'done' | 'madeAt' | 'id'>[]): Map<string, boolean> {
  const sorted = [...records].sort((a, b) => a.madeAt.localeCompare(b.madeAt) || a.id - b.id);
  const state = new Map<string, boolean>();
  for (const record of sorted) state.set(`${record.kind}:${record.itemKey}`, record.done);
  return state;
}

function countDone(records: ProgressRecord[]): BuildSummary['progress'] {
  const progress = { cut: 0, kit: 0, step: 0 };
  for (const [key, done] of doneItems(records)) {
    if (done) progress[key.slice(0, key.indexOf(':')) as keyof typeof progress] += 1;
  }
  return progress;
}

export function createBuildsService(db: Database) {
  const { Build, BuildAssignee, BuildStateChange, BuildProgress, Design, DesignRevision, User } = db.models;
  const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
    db.sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });

  async function buildersOf(buildIds: number[]): Promise<Map<number, { id: number; displayName: string }[]>> {
    const map = new Map<number, { id: number; displayName: string }[]>();
    if (buildIds.length === 0) return map;
    const rows = await select<{ buildId: number; id: number; displayName: string }>(
      `SELECT a.build_id AS buildId, u.id AS id, u.display_name AS displayName
         FROM build_assignees a JOIN users u ON u.id = a.user_id
        WHERE a.build_id IN (:buildIds) ORDER BY u.display_name, u.id`,
      { buildIds },
    );
    for (const row of rows) map.set(row.buildId, [...(map.get(row.buildId) ?? []), { id: row.id, displayName: row.displayName }]);
    return map;
  }

  async function recordsOf(buildIds: number[], revisionOf: Map<number, number>): Promise<Map<number, ProgressRecord[]>> {
    const map = new Map<number, ProgressRecord[]>();
    if (buildIds.length === 0) return map;
    const rows = await select<{ buildId: number; id: number; revision: number; kind: ProgressRecord['kind']; itemKey: string; done: number | boolean; clientId: string; madeById: number; madeByName: string; madeAt: string }>(
      `SELECT p.build_id AS buildId, p.id AS id, p.revision AS revision, p.kind AS kind, p.item_key AS itemKey,
              p.done AS done, p.client_id AS clientId, u.id AS madeById, u.display_name AS madeByName, p.made_at AS madeAt
         FROM build_progress p JOIN users u ON u.id = p.made_by
        WHERE p.build_id IN (:buildIds) ORDER BY p.made_at, p.id`,
      { buildIds },
    );
    for (const row of rows) {
      if (row.revision !== revisionOf.get(row.buildId)) continue;
      const record: ProgressRecord = {
        id: row.id,
        revision: row.revision,
        kind: row.kind,
        itemKey: row.itemKey,
        done: Boolean(row.done),
        clientId: row.clientId,
        madeBy: { id: row.madeById, displayName: row.madeByName },
        madeAt: sqliteDateToIso(row.madeAt),
      };
      map.set(row.buildId, [...(map.get(row.buildId) ?? []), record]);
    }
    return map;
  }

  async function summaries(rows: BuildRow[]): Promise<{ summaries: BuildSummary[]; records: Map<number, ProgressRecord[]> }> {
    const ids = rows.map((row) => row.id);
    const builders = await buildersOf(ids);
    const records = await recordsOf(ids, new Map(rows.map((row) => [row.id, row.revision])));
    return {
      records,
      summaries: rows.map((row) => ({
        id: row.id,
        designId: row.designId,
        designName: row.designName,
        revision: row.revision,
        latestDesignRevision: row.latestDesignRevision,
        state: row.state,
        dueDate: row.dueDate,
        note: row.note,
        builders: builders.get(row.id) ?? [],
        createdBy: { id: row.createdById, displayName: row.createdByName },
        createdAt: sqliteDateToIso(row.createdAt),
        updatedAt: sqliteDateToIso(row.updatedAt),
        progress: countDone(records.get(row.id) ?? []),
      })),
    };
  }

  async function isAssigned(buildId: number, userId: number): Promise<boolean> {
    return (await BuildAssignee.count({ where: { buildId, userId } })) > 0;
  }

  /** The build if `user` may see it: staff see every build, builders only their own (403 otherwise). */
  async function visibleBuild(user: UserModel, buildId: number): Promise<BuildModel> {
    const build = await Build.findByPk(buildId);
    if (!build) throw notFound('That build');
    if (isStaff(user)) return build;
    if (user.role === 'builder' && (await isAssigned(buildId, user.id))) return build;
    throw new AppError(403, 'forbidden', 'This build is not assigned to you. Ask the designer who planned it if you should work on it.');
  }

  async function detail(buildId: number): Promise<BuildDetail> {
    const [row] = await select<BuildRow>(`${BUILD_SELECT} WHERE b.id = :buildId`, { buildId });
    if (!row) throw notFound('That build');
    const { summaries: [build], records } = await summaries([row]);
    const history = await select<{ fromState: BuildState | null; toState: BuildState; changedById: number; changedByName: string; changedAt: string }>(
      `SELECT c.from_state AS fromState, c.to_state AS toState, u.id AS changedById, u.display_name AS changedByName, c.changed_at AS changedAt
         FROM build_state_changes c JOIN users u ON u.id = c.changed_by WHERE c.build_id = :buildId ORDER BY c.changed_at, c.id`,
      { buildId },
    );
    const stateHistory: StateChange[] = history.map((change) => ({
      fromState: change.fromState,
      toState: change.toState,
      changedBy: { id: change.changedById, displayName: change.changedByName },
      changedAt: sqliteDateToIso(change.changedAt),
    }));
    const earlierRevisionRecords = await BuildProgress.count({ where: { buildId, revision: { [Op.ne]: row.revision } } });
    return { build, stateHistory, records: records.get(buildId) ?? [], earlierRevisionRecords };
  }

  async function requireRevision(designId: number, revision: number | undefined): Promise<number> {
    const design = await Design.findByPk(designId);
    if (!design || design.archivedAt) throw new AppError(400, 'invalid_request', 'That design does not exist or was deleted.', { fields: { designId: 'Choose an existing design' } });
    const number = revision ?? design.latestRevision;
    const exists = await DesignRevision.count({ where: { designId, number } });
    if (!exists) throw new AppError(400, 'invalid_request', `The design has no revision ${number}.`, { fields: { revision: `Choose a revision from 1 to ${design.latestRevision}` } });
    return number;
  }

  async function requireBuilders(ids: number[]): Promise<void> {
    const found = await User.findAll({ where: { id: ids, role: 'builder', active: true }, attributes: ['id'] });
    const missing = ids.filter((id) => !found.some((user) => user.id === id));
    if (missing.length > 0) {
      throw new AppError(400, 'invalid_request', `Only active builders can be assigned; user ${missing.join(', ')} is not one.`, { fields: { builderIds: 'Choose active builders' } });
    }
  }

  return {
    /** Staff see every build (optionally of one design); a builder sees the builds assigned to them. */
    async list(user: UserModel, designId?: number): Promise<BuildSummary[]> {
      const where: string[] = [];
      const replacements: Record<string, unknown> = {};
      if (!isStaff(user)) {
        where.push('b.id IN (SELECT build_id FROM build_assignees WHERE user_id = :userId)');
        replacements.userId = user.id;
      }
      if (designId !== undefined) {
        where.push('b.design_id = :designId');
        replacements.designId = designId;
      }
      const rows = await select<BuildRow>(`${BUILD_SELECT}${where.length ? ` WHERE ${where.join(' AND ')}` : ''} ORDER BY b.id DESC`, replacements);
      const list = (await summaries(rows)).summaries;
      // By state (open work first), then the nearest due date, undated last.
      return list.sort((a, b) => STATE_ORDER[a.state] - STATE_ORDER[b.state] || (a.dueDate ?? '9999').localeCompare(b.dueDate ?? '9999') || b.id - a.id);
    },

    async get(user: UserModel, buildId: number): Promise<BuildDetail> {
      await visibleBuild(user, buildId);
      return detail(buildId);
    },

    async create(actor: UserModel, body: CreateBuildBody): Promise<BuildDetail> {
      const revision = await requireRevision(body.designId, body.revision);
      await requireBuilders(body.builderIds);
      const id = await db.write(async (transaction) => {
        const now = new Date();
        const build = await Build.create(
          { designId: body.designId, revision, state: 'planned', dueDate: body.dueDate ?? null, note: body.note || null, createdBy: actor.id },
          { transaction },
        );
        await BuildAssignee.bulkCreate(body.builderIds.map((userId) => ({ buildId: build.id, userId, assignedBy: actor.id, assignedAt: now })), { transaction });
        await BuildStateChange.create({ buildId: build.id, fromState: null, toState: 'planned', changedBy: actor.id, changedAt: now }, { transaction });
        return build.id;
      });
      return detail(id);
    },

    async update(actor: UserModel, buildId: number, body: PatchBuildBody): Promise<BuildDetail> {
      const existing = await Build.findByPk(buildId);
      if (!existing) throw notFound('That build');
      const revision = body.revision === undefined ? undefined : await requireRevision(existing.designId, body.revision);
      if (body.builderIds) await requireBuilders(body.builderIds);
      await db.write(async (transaction) => {
        const build = (await Build.findByPk(buildId, { transaction }))!;
        if (revision !== undefined) build.revision = revision;
        if (body.dueDate !== undefined) build.dueDate = body.dueDate;
        if (body.note !== undefined) build.note = body.note || null;
        build.changed('updatedAt', true);
        await build.save({ transaction });
        if (body.builderIds) {
          await BuildAssignee.destroy({ where: { buildId, userId: { [Op.notIn]: body.builderIds } }, transaction });
          const kept = (await BuildAssignee.findAll({ where: { buildId }, transaction })).map((row) => row.userId);
          const added = body.builderIds.filter((id) => !kept.includes(id));
          await BuildAssignee.bulkCreate(added.map((userId) => ({ buildId, userId, assignedBy: actor.id, assignedAt: new Date() })), { transaction });
        }
      });
      return detail(buildId);
    },

    async changeState(actor: UserModel, buildId: number, state: BuildState): Promise<BuildDetail> {
      await visibleBuild(actor, buildId);
      await db.write(async (transaction) => {
        const build = (await Build.findByPk(buildId, { transaction }))!;
        if (build.state === state) return;
        await BuildStateChange.create({ buildId, fromState: build.state, toState: state, changedBy: actor.id, changedAt: new Date() }, { transaction });
        build.state = state;
        await build.save({ transaction });
      });
      return detail(buildId);
    },

    /**
     * Stores ticks from an assigned builder, each with the revision it was made on; a record already
     * stored (same clientId) is skipped. Answers a notice when the ticks were made on a revision the
     * build no longer follows, or the design has moved past the build's revision.
     */
    async tick(actor: UserModel, buildId: number, body: TickBody): Promise<BuildDetail & { notice: BuildNotice | null; stored: number }> {
      if (actor.role !== 'builder' || !(await isAssigned(buildId, actor.id))) {
        if (!(await Build.findByPk(buildId))) throw notFound('That build');
        throw new AppError(403, 'forbidden', 'Only the builders assigned to this build can tick its progress.');
      }
      const stored = await db.write(async (transaction) => {
        const build = (await Build.findByPk(buildId, { transaction }))!;
        const known = new Set(
          (await BuildProgress.findAll({ where: { buildId, clientId: body.ticks.map((tick) => tick.clientId) }, attributes: ['clientId'], transaction })).map((row) => row.clientId),
        );
        const fresh = body.ticks.filter((tick, index) => !known.has(tick.clientId) && body.ticks.findIndex((other) => other.clientId === tick.clientId) === index);
        const now = new Date();
        await BuildProgress.bulkCreate(
          fresh.map((tick) => ({
            buildId,
            revision: body.revision,
            kind: tick.kind,
            itemKey: tick.itemKey,
            done: tick.done,
            clientId: tick.clientId,
            madeBy: actor.id,
            madeAt: tick.madeAt ? new Date(tick.madeAt) : now,
            recordedAt: now,
          })),
          { transaction },
        );
        // Work on the build moves its state forward on its own (never back, never out of "on hold" or "done").
        const next: BuildState | null =
          body.revision !== build.revision || !fresh.some((tick) => tick.done)
            ? null
            : fresh.some((tick) => tick.kind === 'step' && tick.done) && (build.state === 'planned' || build.state === 'cutting')
              ? 'assembling'
              : build.state === 'planned'
                ? 'cutting'
                : null;
        if (next) {
          await BuildStateChange.create({ buildId, fromState: build.state, toState: next, changedBy: actor.id, changedAt: now }, { transaction });
          build.state = next;
        }
        build.changed('updatedAt', true);
        await build.save({ transaction });
        return fresh.length;
      });
      const result = await detail(buildId);
      let notice: BuildNotice | null = null;
      if (body.revision !== result.build.revision) {
        notice = {
          code: 'superseded_revision',
          message: `These ticks were made on revision ${body.revision}, but this build now follows revision ${result.build.revision}. They are kept with revision ${body.revision}; reload the build and check the steps again on the current revision.`,
        };
      } else if (result.build.latestDesignRevision > result.build.revision) {
        notice = {
          code: 'newer_design_revision',
          message: `The design has a newer revision (${result.build.latestDesignRevision}) than the one this build follows (${result.build.revision}). Your ticks are saved on revision ${result.build.revision}; ask the designer whether the build should move to the new revision.`,
        };
      }
      return { ...result, notice, stored };
    },

    /** Active builders a build can be assigned to. */
    async assignableBuilders(): Promise<{ id: number; displayName: string }[]> {
      const users = await User.findAll({ where: { role: 'builder', active: true }, order: [['displayName', 'ASC']], attributes: ['id', 'displayName'] });
      return users.map((user) => ({ id: user.id, displayName: user.displayName }));
    },

    /** Whether `user` is a builder assigned to a build of that design revision (lets them read it). */
    async builderMayRead(user: UserModel, designId: number, revision: number): Promise<boolean> {
      if (user.role !== 'builder') return false;
      const [row] = await select<{ n: number }>(
        `SELECT COUNT(*) AS n FROM builds b JOIN build_assignees a ON a.build_id = b.id
          WHERE b.design_id = :designId AND a.user_id = :userId
            AND (b.revision = :revision OR EXISTS (SELECT 1 FROM build_progress p WHERE p.build_id = b.id AND p.revision = :revision))`,
        { designId, userId: user.id, revision },
      );
      return (row?.n ?? 0) > 0;
    },
  };
}

export type BuildsService = ReturnType<typeof createBuildsService>;
