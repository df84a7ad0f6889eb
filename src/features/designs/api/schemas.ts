/** The designs endpoints answer with the shared contract's shapes (src/domain/contracts/designs.ts). */
export {
  createDesignResponseSchema,
  designSummarySchema,
  designsListResponseSchema,
  revisionMetaSchema,
  type DesignSummary,
  type RevisionMeta,
} from '@/domain/contracts';
