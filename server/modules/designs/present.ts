import type { DesignDocument } from '../../../src/domain/design/schema';
import { sqliteDateToIso } from '../../db/dates';

import type { DesignSummary, RevisionMeta } from '../../../src/domain/contracts';

/** The response shapes are the contract's (`src/domain/contracts/designs.ts`). */
export type { ApprovalSummary, DesignSummary, PersonRef, RevisionMeta } from '../../../src/domain/contracts';

export interface Revision extends RevisionMeta {
  document: DesignDocument;
}

export const thumbnailUrl = (designId: number, number: number) => `/api/designs/${designId}/revisions/${number}/thumbnail`;

/** A row of the summary query in service.ts. */
export interface SummaryRow {
  id: number;
  name: string;
  systemId: string;
  latestRevision: number;
  updatedAt: string;
  updatedById: number;
  updatedByName: string;
  hasThumbnail: number;
  profileCount: number | null;
  approvalRevision?: number | null;
  approvalDecision?: 'approved' | 'changes_requested' | null;
  approvalBy?: string | null;
  approvalAt?: string | null;
}

export function presentSummary(row: SummaryRow): DesignSummary {
  return {
    id: row.id,
    name: row.name,
    systemId: row.systemId,
    latestRevision: row.latestRevision,
    updatedAt: sqliteDateToIso(row.updatedAt),
    updatedBy: { id: row.updatedById, displayName: row.updatedByName },
    thumbnailUrl: row.hasThumbnail ? thumbnailUrl(row.id, row.latestRevision) : null,
    profileCount: row.profileCount ?? 0,
    approval:
      row.approvalRevision && row.approvalDecision
        ? { revision: row.approvalRevision, decision: row.approvalDecision, by: row.approvalBy ?? '', at: sqliteDateToIso(row.approvalAt ?? null), current: row.approvalRevision === row.latestRevision }
        : null,
  };
}

/** A row of the revision queries in service.ts. */
export interface RevisionRow {
  designId: number;
  number: number;
  createdAt: string;
  createdById: number;
  createdByName: string;
  message: string | null;
  hasThumbnail: number;
  document?: string;
}

export function presentRevisionMeta(row: RevisionRow): RevisionMeta {
  return {
    number: row.number,
    createdAt: sqliteDateToIso(row.createdAt),
    createdBy: { id: row.createdById, displayName: row.createdByName },
    message: row.message,
    thumbnailUrl: row.hasThumbnail ? thumbnailUrl(row.designId, row.number) : null,
  };
}

/** A stored revision: its metadata and the document as the JSON text in the database. */
export interface StoredRevision {
  meta: RevisionMeta;
  documentJson: string;
}
