/**
 * The work one analysis worker thread does: check the posted JSON as a design document, analyse
 * it, and hand back JSON text, so the request thread only forwards bytes.
 */
import { analyzeDesign } from '../../../src/domain/analyze';
import { parseDesignDocument } from '../../../src/domain/design/parse';

export type AnalysisTaskResult = { ok: true; json: string } | { ok: false; errors: { path: string; message: string }[] };

export default function analyseDocument(document: unknown): AnalysisTaskResult {
  const parsed = parseDesignDocument(document);
  if (!parsed.ok) return { ok: false, errors: parsed.errors };
  return { ok: true, json: JSON.stringify({ analysis: analyzeDesign(parsed.design) }) };
}
