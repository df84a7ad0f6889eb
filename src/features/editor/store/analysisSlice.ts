import type { AnalysisSlice, SliceSet } from './types';

/** The latest analysis result, written by the analysis runner (worker or main thread). */
export function createAnalysisSlice(set: SliceSet): AnalysisSlice {
  return {
    analysis: null,
    analysisStatus: 'idle',
    analysedDesign: null,
    setAnalysisRunning() {
      set({ analysisStatus: 'running' });
    },
    setAnalysisResult(design, analysis) {
      set({ analysis, analysedDesign: design, analysisStatus: 'ready' });
    },
    setAnalysisFailed() {
      set({ analysisStatus: 'error' });
    },
  };
}
