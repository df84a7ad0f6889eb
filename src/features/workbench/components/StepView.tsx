import { memo, useMemo, useRef, useState } from 'react';
import { RotateCcw } from 'lucide-react';
import { DesignViewer, framedPartIds, StepPlayerScene, type CameraRequest, type PlayerView } from '@/components/viewer';
import type { SequenceStep } from '@/domain/assembly';
import type { DesignDocument } from '@/domain/design/schema';

const noop = () => {};

/**
 * The step's picture in the shared 3D viewer with the exploded-view player: earlier steps in
 * place, this step's parts travelling in along their insertion directions, later steps faint. The
 * camera frames the piece built so far; orbit and pinch zoom work as in every viewer.
 */
export const StepView = memo(function StepView({ design, steps, index }: { design: DesignDocument; steps: readonly SequenceStep[]; index: number }) {
  const [replayNonce, setReplayNonce] = useState(0);
  const view = useMemo<PlayerView>(() => ({ steps, stepIndex: index, ghostLater: true, explode: 0, replayNonce }), [steps, index, replayNonce]);
  const nonce = useRef(0);
  const cameraRequest = useMemo<CameraRequest | null>(() => {
    const ids = framedPartIds(steps, index);
    if (ids.length === 0) return null;
    nonce.current += 1;
    return { ids, nonce: nonce.current };
  }, [steps, index]);
  const display = useMemo(() => ({ units: design.units, findingMarkers: false }), [design.units]);
  const step = steps[index];
  return (
    <div className="relative h-full w-full overflow-hidden rounded-card border border-paper-line" role="img" aria-label={step ? `Step ${index + 1}: ${step.title}. Earlier parts in place, this step's parts moving in along the way they go in, later parts faint.` : 'No step'}>
      <DesignViewer design={design} display={display} cameraRequest={cameraRequest} frameKey={null} testId="step-canvas">
        <StepPlayerScene view={view} onSettled={noop} />
      </DesignViewer>
      <button
        type="button"
        onClick={() => setReplayNonce((n) => n + 1)}
        className="absolute bottom-2 left-2 inline-flex min-h-11 items-center gap-1 rounded-lg border border-paper-line bg-paper-raised/90 px-3 text-sm text-ink focus-ring"
      >
        <RotateCcw aria-hidden className="size-4" /> Show again
      </button>
    </div>
  );
});
