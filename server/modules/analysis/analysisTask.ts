/**
 * The work one analysis worker thread does: check the posted JSON as a design document, analyse
 * it, and hand back JSON text, so the request thread only forwards bytes.
 */
import type { MessagePort } from 'node:worker_threads';
import { analyzeDesign } from '../../../src/domain/analysis/analyze';
import { parseDesignDocument } from '../../../src/domain/design/parse';

export type AnalysisTaskResult = { ok: true; json: string } | { ok: false; errors: { path: string; message: string }[] };

export interface AnalysisTask {
  document: unknown;
  /** Told "started" when this thread begins the task, so the time limit counts work, not queueing. */
  started?: MessagePort;
}

export default function analyseDocument({ document, started }: AnalysisTask): AnalysisTaskResult {
  started?.postMessage('started');
  started?.close();
  const parsed = parseDesignDocument(document);
  if (!parsed.ok) return { ok: false, errors: parsed.errors };
  return { ok: true, json: JSON.stringify({ analysis: analyzeDesign(parsed.design) }) };
}
