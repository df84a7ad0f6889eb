import { useMemo } from 'react';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { buildInstructions, designCautions } from '@/domain/buildInstructions';
import { useBuild } from '../api/getBuild';
import { useBuildRevision } from '../api/getBuildRevision';

/** The build, the design revision it follows, and what the workbench derives from them. */
export function useBuildData(buildId: number) {
  const build = useBuild(buildId);
  const detail = build.data;
  const revision = useBuildRevision(detail?.build.designId, detail?.build.revision);
  const design = revision.data;
  const derived = useMemo(() => {
    if (!design) return null;
    const analysis = analyzeDesign(design, undefined, { timings: false });
    return { analysis, steps: buildInstructions(design, analysis), cautions: designCautions(analysis) };
  }, [design]);
  return { build, revision, detail, design, ...(derived ?? { analysis: undefined, steps: undefined, cautions: undefined }) };
}

/** The kit line key ticked on the server. */
export const kitItemKey = (line: { category: string; code: string; description: string }) => `${line.category}:${line.code}:${line.description}`.slice(0, 200);
