import { useEffect } from 'react';
import { startAnalysisRunner } from '../analysis/analysisRunner';
import { useEditorStoreApi } from '../store/editorStore';

/** Runs the design checks and outputs whenever the design changes, for as long as the editor is mounted. */
export function useLiveAnalysis(): void {
  const store = useEditorStoreApi();
  useEffect(() => startAnalysisRunner(store), [store]);
}
