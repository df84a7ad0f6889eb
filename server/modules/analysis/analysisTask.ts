/**
 * The work one analysis worker thread does: parse the request body's JSON text, check its shape,
 * count the parts against the limit, check the design document, analyse it, and hand back JSON
 * text. The request thread only forwards bytes, so a large or hostile body never holds it up.
 */
import type { MessagePort } from 'node:worker_threads';
import { analyzeDesign } from '../../../src/domain/analysis/analyze';
import { countDesignParts } from '../../../src/domain/checks/findingCap';
import { parseDesignDocument } from '../../../src/domain/design/parse';
import { describeZodIssues } from '../../middleware/zodFields';
import { analysisBodySchema } from './schemas';

export type AnalysisTaskResult =
  | { ok: true; json: string }
  | { ok: false; errors: { path: string; message: string }[] }
  /** The body is not JSON, or not `{ document }`: a 400 with this code, message and fields. */
  | { ok: false; refused: { code: string; message: string; fields?: Record<string, string> } }
  /** More parts than `maxParts`: a 413. */
  | { ok: false; tooLarge: { parts: number } }
  /** The client went away before the work began. */
  | { ok: false; cancelled: true };

export interface AnalysisTask {
  /** The request body as JSON text. */
  body: string;
  /** Parts (profiles + joints + panels + accessories) analysed at most. */
  maxParts: number;
  /** Shared with the request thread: 1 once the client has gone away, so queued work is skipped. */
  cancelled?: Int32Array;
  /** Told "started" when this thread begins the task, so the time limit counts work, not queueing. */
  started?: MessagePort;
}

export default function analyseDocument({ body, maxParts, cancelled, started }: AnalysisTask): AnalysisTaskResult {
  started?.postMessage('started');
  started?.close();
  const gone = () => cancelled !== undefined && Atomics.load(cancelled, 0) === 1;
  if (gone()) return { ok: false, cancelled: true };
  let value: unknown;
  try {
    value = JSON.parse(body);
  } catch {
    return { ok: false, refused: { code: 'malformed_json', message: 'The request body is not valid JSON.' } };
  }
  const shape = analysisBodySchema.safeParse(value);
  if (!shape.success) {
    const { fields, message } = describeZodIssues(shape.error.issues, '');
    return { ok: false, refused: { code: 'invalid_request', message, fields } };
  }
  const { document } = shape.data;
  const parts = countDesignParts(document);
  if (parts > maxParts) return { ok: false, tooLarge: { parts } };
  if (gone()) return { ok: false, cancelled: true };
  const parsed = parseDesignDocument(document);
  if (!parsed.ok) return { ok: false, errors: parsed.errors };
  return { ok: true, json: JSON.stringify({ analysis: analyzeDesign(parsed.design) }) };
}
