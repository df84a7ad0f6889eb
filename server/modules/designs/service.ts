import { QueryTypes } from 'sequelize';
import type { DesignDocument } from '../../../src/domain/design/schema';
import type { Database } from '../../db/database';
import type { UserModel } from '../../db/models/user';
import { AppError, notFound } from '../../middleware/appError';
import { documentJson as jsonOfDocument } from './documentJson';
import {
  presentRevisionMeta,
  thumbnailUrl,
  presentSummary,
  type DesignSummary,
  type Revision,
  type RevisionMeta,
  type RevisionRow,
  type StoredRevision,
  type SummaryRow,
} from './present';

// Reads the designs row and its author only: a revision row is never touched, because its columns
// after the document sit behind megabytes of overflow pages for a large design.
const SUMMARY_SELECT = `
  SELECT d.id AS id, d.name AS name, d.system_id AS systemId, d.latest_revision AS latestRevision,
         d.updated_at AS updatedAt, u.id AS updatedById, u.display_name AS updatedByName,
         d.has_thumbnail AS hasThumbnail, d.profile_count AS profileCount,
         rd.revision_number AS approvalRevision, rd.decision AS approvalDecision, du.display_name AS approvalBy, rd.created_at AS approvalAt
    FROM designs d
    JOIN users u ON u.id = COALESCE(d.updated_by, d.created_by)
    LEFT JOIN review_decisions rd ON rd.id = (SELECT x.id FROM review_decisions x WHERE x.design_id = d.id ORDER BY x.created_at DESC, x.id DESC LIMIT 1)
    LEFT JOIN users du ON du.id = rd.decided_by
   WHERE d.archived_at IS NULL`;

const REVISION_SELECT = `
  SELECT r.design_id AS designId, r.number AS number, r.created_at AS createdAt, u.id AS createdById,
         u.display_name AS createdByName, r.message AS message, (r.thumbnail IS NOT NULL) AS hasThumbnail`;

export interface NewRevision {
  document: DesignDocument;
  thumbnail?: Buffer;
  message?: string;
}

/** The counts stored beside a revision, so lists never parse documents. */
const countsOf = (document: DesignDocument) => ({
  profileCount: document.profiles.length,
  jointCount: document.joints.length,
  panelCount: document.panels.length,
});

/** Parsed documents of recent revisions kept for the next save's check: at most this many, and this much JSON. */
const PARSED_KEPT = 16;
const PARSED_KEPT_BYTES = 32 * 1024 * 1024;

/**
 * The parsed documents of the revisions saved last, by design and number (least recently used out
 * first). A revision never changes, so nothing here goes stale. The next save of the design is
 * checked against its base revision's parts (parseEditedDocument). Kept documents are never mutated.
 */
function keptParsedRevisions() {
  const kept = new Map<string, { document: DesignDocument; bytes: number }>();
  let bytes = 0;
  const keyOf = (designId: number, number: number) => `${designId}:${number}`;
  return {
    get(designId: number, number: number): DesignDocument | undefined {
      const key = keyOf(designId, number);
      const entry = kept.get(key);
      if (!entry) return undefined;
      kept.delete(key);
      kept.set(key, entry);
      return entry.document;
    },
    set(designId: number, number: number, document: DesignDocument, jsonBytes: number): void {
      if (jsonBytes > PARSED_KEPT_BYTES / 2) return;
      kept.set(keyOf(designId, number), { document, bytes: jsonBytes });
      bytes += jsonBytes;
      for (const [key, entry] of kept) {
        if (kept.size <= PARSED_KEPT && bytes <= PARSED_KEPT_BYTES) break;
        kept.delete(key);
        bytes -= entry.bytes;
      }
    },
  };
}

export function createDesignsService(db: Database) {
  const { Design, DesignRevision } = db.models;
  const parsed = keptParsedRevisions();
  const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
    db.sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });

  async function summary(id: number): Promise<DesignSummary> {
    const [row] = await select<SummaryRow>(`${SUMMARY_SELECT} AND d.id = :id`, { id });
    if (!row) throw notFound('That design');
    return presentSummary(row);
  }

  async function revision(designId: number, number: number): Promise<StoredRevision> {
    const [row] = await select<RevisionRow>(
      `${REVISION_SELECT}, r.document AS document
         FROM design_revisions r JOIN designs d ON d.id = r.design_id JOIN users u ON u.id = r.created_by
        WHERE r.design_id = :designId AND r.number = :number AND d.archived_at IS NULL`,
      { designId, number },
    );
    if (!row) throw notFound('That revision');
    return { meta: presentRevisionMeta(row), documentJson: row.document ?? 'null' };
  }

  /** The answer to a save (without its document), built from what was just written rather than read back. */
  function savedMeta(designId: number, number: number, author: UserModel, input: NewRevision, createdAt: Date): RevisionMeta {
    return {
      number,
      createdAt: createdAt.toISOString(),
      createdBy: { id: author.id, displayName: author.displayName },
      message: input.message ?? null,
      thumbnailUrl: input.thumbnail ? thumbnailUrl(designId, number) : null,
    };
  }

  return {
    async list(): Promise<DesignSummary[]> {
      const rows = await select<SummaryRow>(`${SUMMARY_SELECT} ORDER BY d.updated_at DESC, d.id DESC`);
      return rows.map(presentSummary);
    },

    async getLatest(id: number): Promise<{ design: DesignSummary; revision: StoredRevision }> {
      const design = await summary(id);
      return { design, revision: await revision(id, design.latestRevision) };
    },

    /** Creates the design and its revision 1 in one transaction. */
    async create(author: UserModel, document: DesignDocument, extras: Omit<NewRevision, 'document'> = {}): Promise<{ design: DesignSummary; revision: Revision }> {
      const input: NewRevision = { ...extras, document };
      const documentJson = jsonOfDocument(document);
      const { id, createdAt } = await db.write(async (transaction) => {
        const design = await Design.create(
          {
            name: document.name,
            systemId: document.systemId,
            createdBy: author.id,
            latestRevision: 1,
            updatedBy: author.id,
            profileCount: document.profiles.length,
            hasThumbnail: Boolean(extras.thumbnail),
          },
          { transaction },
        );
        const row = await DesignRevision.create(
          {
            designId: design.id,
            number: 1,
            document: documentJson,
            ...countsOf(document),
            thumbnail: extras.thumbnail ?? null,
            message: extras.message ?? null,
            createdBy: author.id,
          },
          { transaction },
        );
        return { id: design.id, createdAt: row.createdAt };
      });
      parsed.set(id, 1, document, documentJson.length);
      return { design: await summary(id), revision: { ...savedMeta(id, 1, author, input, createdAt), document } };
    },

    /**
     * Saves a new revision if `baseRevision` is still the latest; otherwise refuses with 409 and the
     * latest number, so the client can merge or reload without losing either side's work.
     */
    async saveRevision(designId: number, author: UserModel, baseRevision: number, input: NewRevision): Promise<StoredRevision> {
      // Serialised once, outside the write lock; the same text is stored and sent back.
      const documentJson = jsonOfDocument(input.document);
      const { number, createdAt } = await db.write(async (transaction) => {
        const design = await Design.findByPk(designId, { transaction });
        if (!design || design.archivedAt) throw notFound('That design');
        if (design.latestRevision !== baseRevision) {
          throw new AppError(
            409,
            'stale_revision',
            `This design was saved by someone else since revision ${baseRevision}; the latest is revision ${design.latestRevision}. Reload it to see their changes before saving again.`,
            { details: { latestRevision: design.latestRevision } },
          );
        }
        const next = design.latestRevision + 1;
        const row = await DesignRevision.create(
          {
            designId,
            number: next,
            document: documentJson,
            ...countsOf(input.document),
            thumbnail: input.thumbnail ?? null,
            message: input.message ?? null,
            createdBy: author.id,
          },
          { transaction },
        );
        design.latestRevision = next;
        design.updatedBy = author.id;
        design.profileCount = input.document.profiles.length;
        design.hasThumbnail = Boolean(input.thumbnail);
        design.name = input.document.name;
        design.systemId = input.document.systemId;
        await design.save({ transaction });
        return { number: next, createdAt: row.createdAt };
      });
      parsed.set(designId, number, input.document, documentJson.length);
      return { meta: savedMeta(designId, number, author, input, createdAt), documentJson };
    },

    /** The parsed document of a revision saved recently by this server, if still kept. */
    parsedRevision: (designId: number, number: number): DesignDocument | undefined => parsed.get(designId, number),

    async listRevisions(designId: number): Promise<RevisionMeta[]> {
      await summary(designId);
      const rows = await select<RevisionRow>(
        `${REVISION_SELECT} FROM design_revisions r JOIN users u ON u.id = r.created_by
          WHERE r.design_id = :designId ORDER BY r.number DESC`,
        { designId },
      );
      return rows.map(presentRevisionMeta);
    },

    getRevision: revision,

    async getThumbnail(designId: number, number: number): Promise<Buffer> {
      const row = await DesignRevision.findOne({
        where: { designId, number },
        attributes: ['thumbnail'],
        include: [],
      });
      const design = await Design.findByPk(designId, { attributes: ['id', 'archivedAt'] });
      if (!row || !row.thumbnail || !design || design.archivedAt) throw notFound('That thumbnail');
      return row.thumbnail;
    },

    /** Hides the design (its revisions are kept). Only an owner or the design's creator may. */
    async archive(designId: number, actor: UserModel): Promise<void> {
      await db.write(async (transaction) => {
        const design = await Design.findByPk(designId, { transaction });
        if (!design || design.archivedAt) throw notFound('That design');
        if (actor.role !== 'owner' && design.createdBy !== actor.id) {
          throw new AppError(403, 'forbidden', 'Only the shop owner or the designer who created this design can delete it.');
        }
        design.archivedAt = new Date();
        await design.save({ transaction });
      });
    },
  };
}

export type DesignsService = ReturnType<typeof createDesignsService>;
