import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import type { Database } from '../../db/database';
import { sqliteDateToIso } from '../../db/dates';
import type { ReviewDecision } from '../../db/models/sharing';
import type { UserModel } from '../../db/models/user';
import { AppError, notFound } from '../../middleware/appError';
import { INVITATION_VALID_DAYS, resetPagePath, type PasswordResets } from '../auth/passwordReset';
import type { Passwords } from '../auth/passwords';
import type { PersonRef, StoredRevision } from '../designs/present';
import { createDesignsService } from '../designs/service';
import type { Mailer } from '../mail/mailService';
import { decisionMail, newCommentMail, reviewInvitationMail } from '../mail/messages';

export interface ReviewComment {
  id: number;
  revision: number;
  partId: string | null;
  position: [number, number, number] | null;
  body: string;
  parentId: number | null;
  author: PersonRef & { role: string };
  createdAt: string;
}

export interface ReviewDecisionView {
  id: number;
  revision: number;
  decision: ReviewDecision;
  note: string;
  decidedBy: PersonRef;
  decidedAt: string;
}

export interface SharedDesign {
  designId: number;
  name: string;
  latestRevision: number;
  updatedAt: string;
  /** The newest decision on any revision, or null. */
  lastDecision: ReviewDecisionView | null;
  commentCount: number;
}

export interface ShareView {
  customer: PersonRef & { email: string };
  invitedBy: PersonRef;
  invitedAt: string;
}

export const reviewPagePath = (designId: number) => `/reviews/${designId}`;
const designPagePath = (designId: number) => `/designs/${designId}`;

interface DecisionRow {
  id: number;
  revision: number;
  decision: ReviewDecision;
  note: string;
  decidedById: number;
  decidedByName: string;
  createdAt: string;
}

const presentDecision = (row: DecisionRow): ReviewDecisionView => ({
  id: row.id,
  revision: row.revision,
  decision: row.decision,
  note: row.note,
  decidedBy: { id: row.decidedById, displayName: row.decidedByName },
  decidedAt: sqliteDateToIso(row.createdAt),
});

const DECISION_SELECT = `SELECT r.id AS id, r.revision_number AS revision, r.decision AS decision, r.note AS note,
  u.id AS decidedById, u.display_name AS decidedByName, r.created_at AS createdAt
  FROM review_decisions r JOIN users u ON u.id = r.decided_by`;

/**
 * Customer review: designers invite customers by e-mail; customers see only the designs shared with
 * them, pin comments to parts and approve a revision or ask for changes. A decision belongs to one
 * revision, so a later save needs its own approval.
 */
export function createReviewsService(deps: { db: Database; passwords: Passwords; resets: PasswordResets; mailer: Mailer }) {
  const { db, passwords, resets, mailer } = deps;
  const { User, Design, DesignShare, ReviewComment: Comment, ReviewDecision: Decision } = db.models;
  const designs = createDesignsService(db);
  const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
    db.sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });

  /** The design if `actor` may review it: owner and designer always, a customer only when shared. */
  async function reviewable(actor: UserModel, designId: number) {
    const design = await Design.findByPk(designId);
    if (!design || design.archivedAt) throw notFound('That design');
    if (actor.role === 'owner' || actor.role === 'designer') return design;
    if (actor.role === 'customer' && (await DesignShare.count({ where: { designId, customerId: actor.id } }))) return design;
    // Customers learn nothing about designs not shared with them.
    throw notFound('That design');
  }

  async function decisions(designId: number): Promise<ReviewDecisionView[]> {
    const rows = await select<DecisionRow>(`${DECISION_SELECT} WHERE r.design_id = :designId ORDER BY r.created_at DESC, r.id DESC`, { designId });
    return rows.map(presentDecision);
  }

  async function comments(designId: number): Promise<ReviewComment[]> {
    const rows = await Comment.findAll({ where: { designId }, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
    const authors = new Map((await User.findAll({ where: { id: [...new Set(rows.map((row) => row.authorId))] } })).map((user) => [user.id, user]));
    return rows.map((row) => {
      const author = authors.get(row.authorId);
      const position = typeof row.position === 'string' ? (JSON.parse(row.position) as [number, number, number]) : row.position;
      return {
        id: row.id,
        revision: row.revisionNumber,
        partId: row.partId,
        position: position ?? null,
        body: row.body,
        parentId: row.parentId,
        author: { id: row.authorId, displayName: author?.displayName ?? 'Former user', role: author?.role ?? 'customer' },
        createdAt: row.createdAt.toISOString(),
      };
    });
  }

  /** Who hears about a customer's comment or decision: everyone who invited a customer to this design. */
  async function designTeamEmails(designId: number): Promise<string[]> {
    const rows = await select<{ email: string }>(
      `SELECT DISTINCT u.email AS email FROM design_shares s JOIN users u ON u.id = s.invited_by WHERE s.design_id = :designId AND u.active = 1`,
      { designId },
    );
    return rows.map((row) => row.email);
  }

  async function customerEmails(designId: number): Promise<string[]> {
    const rows = await select<{ email: string }>(
      `SELECT u.email AS email FROM design_shares s JOIN users u ON u.id = s.customer_id WHERE s.design_id = :designId AND u.active = 1`,
      { designId },
    );
    return rows.map((row) => row.email);
  }

  return {
    /** Shares the design with a customer, making the account when the email is new; sends the invitation. */
    async invite(actor: UserModel, designId: number, input: { email: string; displayName?: string }, baseUrl: string): Promise<{ share: ShareView; accountCreated: boolean }> {
      const design = await reviewable(actor, designId);
      let customer = await User.findOne({ where: { email: input.email } });
      let accountCreated = false;
      if (customer && customer.role !== 'customer') {
        throw new AppError(409, 'not_a_customer', `${input.email} belongs to a ${customer.role} account; only customer accounts can be invited to review.`, { fields: { email: 'This address belongs to a staff account' } });
      }
      if (customer && !customer.active) {
        throw new AppError(409, 'account_inactive', `The account ${input.email} is deactivated. Ask the shop owner to reactivate it first.`, { fields: { email: 'This account is deactivated' } });
      }
      if (!customer) {
        // No one knows this random password; the invitation carries a link to choose one.
        const passwordHash = await passwords.hash(randomBytes(24).toString('base64url'));
        const displayName = input.displayName ?? input.email.split('@')[0].slice(0, 80);
        customer = await db.write((transaction) => User.create({ email: input.email, displayName, role: 'customer', passwordHash, preferences: { units: 'mm' } }, { transaction }));
        accountCreated = true;
      }
      const customerId = customer.id;
      const share = await db.write(async (transaction) => {
        const existing = await DesignShare.findOne({ where: { designId, customerId }, transaction });
        return existing ?? DesignShare.create({ designId, customerId, invitedBy: actor.id }, { transaction });
      });
      const setPasswordUrl = accountCreated ? `${baseUrl}${resetPagePath(await resets.issue(customer, INVITATION_VALID_DAYS * 86_400_000))}` : undefined;
      await mailer.send(
        reviewInvitationMail({ to: customer.email, customerName: customer.displayName, designName: design.name, inviterName: actor.displayName, reviewUrl: `${baseUrl}${reviewPagePath(designId)}`, setPasswordUrl }),
      );
      return {
        share: { customer: { id: customer.id, displayName: customer.displayName, email: customer.email }, invitedBy: { id: actor.id, displayName: actor.displayName }, invitedAt: share.createdAt.toISOString() },
        accountCreated,
      };
    },

    async shares(actor: UserModel, designId: number): Promise<ShareView[]> {
      await reviewable(actor, designId);
      const rows = await select<{ customerId: number; customerName: string; email: string; inviterId: number; inviterName: string; createdAt: string }>(
        `SELECT c.id AS customerId, c.display_name AS customerName, c.email AS email, i.id AS inviterId, i.display_name AS inviterName, s.created_at AS createdAt
           FROM design_shares s JOIN users c ON c.id = s.customer_id JOIN users i ON i.id = s.invited_by
          WHERE s.design_id = :designId ORDER BY s.created_at`,
        { designId },
      );
      return rows.map((row) => ({
        customer: { id: row.customerId, displayName: row.customerName, email: row.email },
        invitedBy: { id: row.inviterId, displayName: row.inviterName },
        invitedAt: sqliteDateToIso(row.createdAt),
      }));
    },

    /** The designs shared with a customer. */
    async listForCustomer(customer: UserModel): Promise<SharedDesign[]> {
      const rows = await select<{ designId: number; name: string; latestRevision: number; updatedAt: string; commentCount: number }>(
        `SELECT d.id AS designId, d.name AS name, d.latest_revision AS latestRevision, d.updated_at AS updatedAt,
                (SELECT COUNT(*) FROM review_comments c WHERE c.design_id = d.id) AS commentCount
           FROM design_shares s JOIN designs d ON d.id = s.design_id
          WHERE s.customer_id = :customerId AND d.archived_at IS NULL ORDER BY d.updated_at DESC`,
        { customerId: customer.id },
      );
      return Promise.all(
        rows.map(async (row) => ({ ...row, updatedAt: sqliteDateToIso(row.updatedAt), lastDecision: (await decisions(row.designId))[0] ?? null })),
      );
    },

    /** One design's review: the chosen (default latest) revision, comments and decisions. */
    async get(actor: UserModel, designId: number, revisionNumber?: number): Promise<{ design: { id: number; name: string; latestRevision: number }; revision: StoredRevision; comments: ReviewComment[]; decisions: ReviewDecisionView[] }> {
      const design = await reviewable(actor, designId);
      const revision = await designs.getRevision(designId, revisionNumber ?? design.latestRevision);
      return { design: { id: design.id, name: design.name, latestRevision: design.latestRevision }, revision, comments: await comments(designId), decisions: await decisions(designId) };
    },

    async comment(actor: UserModel, designId: number, input: { revision: number; partId?: string | null; position?: [number, number, number] | null; body: string; parentId?: number | null }, baseUrl: string): Promise<ReviewComment> {
      const design = await reviewable(actor, designId);
      if (input.revision > design.latestRevision) throw new AppError(400, 'invalid_request', `Revision ${input.revision} does not exist; the latest is ${design.latestRevision}.`, { fields: { revision: 'No such revision' } });
      if (input.parentId != null && !(await Comment.count({ where: { id: input.parentId, designId } }))) {
        throw new AppError(400, 'invalid_request', 'The comment you answer is not on this design.', { fields: { parentId: 'No such comment on this design' } });
      }
      const row = await db.write((transaction) =>
        Comment.create({ designId, revisionNumber: input.revision, partId: input.partId ?? null, position: input.position ?? null, body: input.body, parentId: input.parentId ?? null, authorId: actor.id }, { transaction }),
      );
      const recipients = actor.role === 'customer' ? await designTeamEmails(designId) : await customerEmails(designId);
      const url = `${baseUrl}${actor.role === 'customer' ? designPagePath(designId) : reviewPagePath(designId)}`;
      for (const to of recipients.filter((email) => email !== actor.email)) {
        await mailer.send(newCommentMail({ to, designName: design.name, authorName: actor.displayName, body: input.body, partId: input.partId ?? null, reviewUrl: url }));
      }
      return (await comments(designId)).find((comment) => comment.id === row.id)!;
    },

    /** A customer approves a revision or asks for changes; the design team is told by e-mail. */
    async decide(actor: UserModel, designId: number, input: { revision: number; decision: ReviewDecision; note?: string }, baseUrl: string): Promise<ReviewDecisionView> {
      if (actor.role !== 'customer') throw new AppError(403, 'forbidden', 'Only the customer the design is shared with can approve it or ask for changes.');
      const design = await reviewable(actor, designId);
      if (input.revision !== design.latestRevision) {
        throw new AppError(409, 'stale_revision', `Revision ${input.revision} is no longer the latest; revision ${design.latestRevision} was saved since. Look at it before deciding.`, { details: { latestRevision: design.latestRevision } });
      }
      const row = await db.write((transaction) =>
        Decision.create({ designId, revisionNumber: input.revision, decision: input.decision, note: input.note ?? '', decidedBy: actor.id }, { transaction }),
      );
      for (const to of await designTeamEmails(designId)) {
        await mailer.send(decisionMail({ to, designName: design.name, revision: input.revision, deciderName: actor.displayName, decision: input.decision, note: input.note ?? '', url: `${baseUrl}${designPagePath(designId)}` }));
      }
      const [view] = await select<DecisionRow>(`${DECISION_SELECT} WHERE r.id = :id`, { id: row.id });
      return presentDecision(view);
    },
  };
}

export type ReviewsService = ReturnType<typeof createReviewsService>;
