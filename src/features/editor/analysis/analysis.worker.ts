/// <reference lib="webworker" />
// Runs the domain checks off the main thread so a drag never waits for them.
import { analyzeDesign } from '@/domain/analysis/analyze';
import { countDesignParts, DEFAULT_ANALYSIS_MAX_PARTS } from '@/domain/checks/findingCap';
import type { AnalysisRequest, AnalysisResponse } from './messages';

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<AnalysisRequest>) => {
  const { requestId, design } = event.data;
  let response: AnalysisResponse;
  try {
    // The same size cap as the server; findings lists are capped inside analyzeDesign.
    const parts = countDesignParts(design);
    if (parts > DEFAULT_ANALYSIS_MAX_PARTS) {
      scope.postMessage({ requestId, ok: false, message: `This design has ${parts} parts; the checks run on at most ${DEFAULT_ANALYSIS_MAX_PARTS}.` } satisfies AnalysisResponse);
      return;
    }
    response = { requestId, ok: true, analysis: analyzeDesign(design) };
  } catch (error) {
    response = { requestId, ok: false, message: error instanceof Error ? error.message : String(error) };
  }
  scope.postMessage(response);
};
