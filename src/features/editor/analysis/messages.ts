import type { DesignAnalysis } from '@/domain/analysis/types';
import type { DesignDocument } from '@/domain/design/schema';

/** Main thread → worker: analyse this design; `requestId` lets the runner drop answers it no longer wants. */
export interface AnalysisRequest {
  requestId: number;
  design: DesignDocument;
}

/** Worker → main thread. */
export type AnalysisResponse =
  | { requestId: number; ok: true; analysis: DesignAnalysis }
  | { requestId: number; ok: false; message: string };
