import { QueryTypes } from 'sequelize';
import type { Database } from '../../db/database';
import { sqliteDateToIso } from '../../db/dates';
import type { UserModel } from '../../db/models/user';
import { AppError, notFound } from '../../middleware/appError';
import type { PersonRef, StoredRevision } from '../designs/present';
import { hashToken, newToken } from './tokens';

export interface LinkView {
  id: number;
  designId: number;
  designName: string;
  /** The pinned revision, or null when the link follows the latest. */
  revision: number | null;
  label: string;
  expiresAt: string | null;
  revokedAt: string | null;
  openCount: number;
  classId: number | null;
  createdAt: string;
  createdBy: PersonRef;
  /** Not revoked and not expired (its class included). */
  active: boolean;
}

export interface NewLink {
  designId: number;
  revision?: number | null;
  label?: string;
  expiresAt?: Date | null;
}

interface LinkRow {
  id: number;
  designId: number;
  designName: string;
  designArchivedAt: string | null;
  revision: number | null;
  label: string;
  expiresAt: string | null;
  revokedAt: string | null;
  openCount: number;
  classId: number | null;
  classExpiresAt: string | null;
  classRevokedAt: string | null;
  createdAt: string;
  createdById: number;
  createdByName: string;
}

const LINK_SELECT = `
  SELECT l.id AS id, l.design_id AS designId, d.name AS designName, d.archived_at AS designArchivedAt,
         l.revision_number AS revision, l.label AS label, l.expires_at AS expiresAt, l.revoked_at AS revokedAt,
         l.open_count AS openCount, l.class_id AS classId, c.expires_at AS classExpiresAt, c.revoked_at AS classRevokedAt,
         l.created_at AS createdAt, u.id AS createdById, u.display_name AS createdByName
    FROM share_links l
    JOIN designs d ON d.id = l.design_id
    JOIN users u ON u.id = l.created_by
    LEFT JOIN classes c ON c.id = l.class_id`;

const isoOrNull = (value: string | null) => (value === null ? null : sqliteDateToIso(value));

function isActive(row: LinkRow, now: number): boolean {
  if (row.revokedAt || row.classRevokedAt || row.designArchivedAt) return false;
  for (const expiry of [row.expiresAt, row.classExpiresAt]) {
    if (expiry && new Date(sqliteDateToIso(expiry)).getTime() <= now) return false;
  }
  return true;
}

function present(row: LinkRow, pendingOpens: number): LinkView {
  return {
    id: row.id,
    designId: row.designId,
    designName: row.designName,
    revision: row.revision,
    label: row.label,
    expiresAt: isoOrNull(row.expiresAt),
    revokedAt: isoOrNull(row.revokedAt ?? row.classRevokedAt),
    openCount: row.openCount + pendingOpens,
    classId: row.classId,
    createdAt: sqliteDateToIso(row.createdAt),
    createdBy: { id: row.createdById, displayName: row.createdByName },
    active: isActive(row, Date.now()),
  };
}

/** One answer for unknown, expired and revoked tokens: the link must not reveal which. */
export const linkNotFound = () => new AppError(404, 'not_found', 'This link does not work. It may have expired or been withdrawn; ask whoever sent it for a new one.');

/** The path of the link viewer page for a token. */
export const linkViewerPath = (token: string) => `/view/${token}`;

export function createLinksService(db: Database) {
  const { ShareLink, Design, DesignRevision } = db.models;
  const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
    db.sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });

  // Opens are counted in memory and written in batches, so a busy link's reads never queue behind writes.
  const pendingOpens = new Map<number, number>();
  async function flushOpens(): Promise<void> {
    if (pendingOpens.size === 0) return;
    const batch = [...pendingOpens];
    pendingOpens.clear();
    // No kept answer shows an open count (server/hotReads.ts), so the counts leave them in place.
    await db.write(
      async (transaction) => {
        for (const [id, count] of batch) await ShareLink.increment('openCount', { by: count, where: { id }, transaction });
      },
      { changesAnswers: false },
    );
  }
  const countOpen = (id: number) => void pendingOpens.set(id, (pendingOpens.get(id) ?? 0) + 1);
  const timer = setInterval(() => void flushOpens().catch(() => undefined), 2000);
  timer.unref();

  async function rowById(id: number): Promise<LinkRow> {
    const [row] = await select<LinkRow>(`${LINK_SELECT} WHERE l.id = :id`, { id });
    if (!row) throw notFound('That link');
    return row;
  }

  return {
    /** Creates a link; the token is returned once and only its hash is kept. */
    async create(actor: UserModel, input: NewLink, classId: number | null = null): Promise<{ link: LinkView; token: string; path: string }> {
      const design = await Design.findByPk(input.designId);
      if (!design || design.archivedAt) throw notFound('That design');
      if (input.revision != null) {
        const exists = await DesignRevision.count({ where: { designId: input.designId, number: input.revision } });
        if (!exists) throw new AppError(400, 'invalid_request', `Revision ${input.revision} of this design does not exist; the latest is ${design.latestRevision}.`, { fields: { revision: `Choose a revision from 1 to ${design.latestRevision}` } });
      }
      const { token, hash } = newToken();
      const created = await db.write((transaction) =>
        ShareLink.create(
          {
            designId: input.designId,
            tokenHash: hash,
            revisionNumber: input.revision ?? null,
            label: input.label ?? '',
            expiresAt: input.expiresAt ?? null,
            classId,
            createdBy: actor.id,
          },
          { transaction },
        ),
      );
      return { link: present(await rowById(created.id), 0), token, path: linkViewerPath(token) };
    },

    /** The owner sees every link; others see the links they made. */
    async list(actor: UserModel, filter: { designId?: number; classIds?: number[] } = {}): Promise<LinkView[]> {
      await flushOpens();
      const where: string[] = [];
      const replacements: Record<string, unknown> = {};
      if (actor.role !== 'owner') {
        where.push('l.created_by = :actor');
        replacements.actor = actor.id;
      }
      if (filter.designId !== undefined) {
        where.push('l.design_id = :designId');
        replacements.designId = filter.designId;
      }
      if (filter.classIds !== undefined) {
        if (filter.classIds.length === 0) return [];
        where.push('l.class_id IN (:classIds)');
        replacements.classIds = filter.classIds;
      }
      const rows = await select<LinkRow>(`${LINK_SELECT}${where.length ? ` WHERE ${where.join(' AND ')}` : ''} ORDER BY l.created_at DESC, l.id DESC`, replacements);
      return rows.map((row) => present(row, 0));
    },

    /** Withdraws a link. Its creator or the owner may. */
    async revoke(actor: UserModel, id: number): Promise<LinkView> {
      await db.write(async (transaction) => {
        const link = await ShareLink.findByPk(id, { transaction });
        if (!link || (actor.role !== 'owner' && link.createdBy !== actor.id)) throw notFound('That link');
        if (!link.revokedAt) {
          link.revokedAt = new Date();
          await link.save({ transaction });
        }
      });
      return present(await rowById(id), 0);
    },

    /**
     * What a link shows: the pinned or latest revision. Every token costs the same work (one hash,
     * one indexed query); unknown, expired and revoked all end in the same 404.
     */
    async open(token: string): Promise<{
      link: { label: string; pinnedRevision: number | null; expiresAt: string | null };
      design: { name: string; systemId: string; latestRevision: number };
      revision: StoredRevision;
      /** The link's row and when it stops working (the earlier of its own and its class's expiry). */
      opened: { id: number; activeUntil: number | null };
    }> {
      const hash = hashToken(token);
      // One indexed query answers every case: the link, its class and design, and the revision it
      // shows (pinned or latest), so a refused token and a shown one cost the same round trip.
      const [row] = await select<LinkRow & { latestRevision: number; systemId: string; shownNumber: number | null; shownCreatedAt: string | null; shownMessage: string | null; document: string | null }>(
        `${LINK_SELECT.replace(
          'SELECT',
          'SELECT d.latest_revision AS latestRevision, d.system_id AS systemId, r.number AS shownNumber, r.created_at AS shownCreatedAt, r.message AS shownMessage, r.document AS document,',
        )}
          LEFT JOIN design_revisions r ON r.design_id = l.design_id AND r.number = COALESCE(l.revision_number, d.latest_revision)
         WHERE l.token_hash = :hash`,
        { hash },
      );
      if (!row || !isActive(row, Date.now()) || row.shownNumber === null || row.shownCreatedAt === null) throw linkNotFound();
      // A visitor sees the revision's number, date and note, not who saved it.
      const revision: StoredRevision = {
        meta: { number: row.shownNumber, createdAt: sqliteDateToIso(row.shownCreatedAt), createdBy: { id: 0, displayName: '' }, message: row.shownMessage, thumbnailUrl: null },
        documentJson: row.document ?? 'null',
      };
      countOpen(row.id);
      const expiries = [row.expiresAt, row.classExpiresAt].filter((expiry) => expiry !== null).map((expiry) => new Date(sqliteDateToIso(expiry)).getTime());
      return {
        opened: { id: row.id, activeUntil: expiries.length ? Math.min(...expiries) : null },
        link: { label: row.label, pinnedRevision: row.revision, expiresAt: isoOrNull(row.expiresAt ?? row.classExpiresAt) },
        design: { name: row.designName, systemId: row.systemId, latestRevision: row.latestRevision },
        revision,
      };
    },

    /** Counts an open of a link whose answer was served from memory (see server/hotReads.ts). */
    countOpen,
    flushOpens,
    stop() {
      clearInterval(timer);
    },
  };
}

export type LinksService = ReturnType<typeof createLinksService>;
