/// <reference lib="webworker" />
// Runs the domain checks off the main thread so a drag never waits for them.
import { analyzeDesign } from '@/domain/analyze';
import type { AnalysisRequest, AnalysisResponse } from './messages';

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<AnalysisRequest>) => {
  const { requestId, design } = event.data;
  let response: AnalysisResponse;
  try {
    response = { requestId, ok: true, analysis: analyzeDesign(design) };
  } catch (error) {
    response = { requestId, ok: false, message: error instanceof Error ? error.message : String(error) };
  }
  scope.postMessage(response);
};
