import { useCallback, useRef } from 'react';
import { ChevronLeft, ChevronRight } from 'lucide-react';
import type { DesignDocument } from '@/domain/design/schema';
import type { SequenceStep } from '@/domain/assembly';
import type { InstructionStep } from '@/domain/buildInstructions';
import { Button } from '@/components/ui';
import type { BuildProgress } from '../hooks/useBuildProgress';
import { StepView } from './StepView';
import { StepDetails } from './StepDetails';
import { TickButton } from './TickButton';

export interface BuildTabProps {
  design: DesignDocument;
  steps: InstructionStep[];
  /** The same steps as the assembly core gives them, for the player (stable between renders). */
  sequenceSteps: readonly SequenceStep[];
  index: number;
  onIndex: (index: number) => void;
  progress: BuildProgress;
  canTick: boolean;
}

/** Step-through: the step in the shared exploded-view player, what the step needs, tick it off; swipe across the step's details or the big buttons move between steps; dragging the picture turns it. */
export function BuildTab({ design, steps, sequenceSteps, index, onIndex, progress, canTick }: BuildTabProps) {
  const step = steps[index];
  const swipeStart = useRef<{ x: number; y: number } | null>(null);
  const go = useCallback((next: number) => onIndex(Math.max(0, Math.min(steps.length - 1, next))), [onIndex, steps.length]);
  if (!step) return <p>This design has no assembly steps.</p>;
  const done = progress.isDone('step', step.id);
  const who = progress.whoTicked('step', step.id);
  const doneCount = steps.filter((item) => progress.isDone('step', item.id)).length;

  return (
    <div
      className="grid gap-4 landscape:lg:grid-cols-[3fr_2fr] landscape:md:grid-cols-[3fr_2fr]"
      onKeyDown={(event) => {
        if (event.key === 'ArrowRight') go(index + 1);
        if (event.key === 'ArrowLeft') go(index - 1);
      }}
    >
      <div className="h-[45vh] min-h-64 select-none landscape:md:h-[60vh]" data-testid="step-picture">
        <StepView design={design} steps={sequenceSteps} index={index} />
      </div>
      {/* Swipes belong to the step's details: on the picture a drag turns the view. */}
      <div
        className="flex touch-pan-y flex-col gap-4"
        data-testid="step-swipe-area"
        onPointerDown={(event) => (swipeStart.current = { x: event.clientX, y: event.clientY })}
        onPointerUp={(event) => {
          const start = swipeStart.current;
          swipeStart.current = null;
          if (!start) return;
          const dx = event.clientX - start.x;
          if (Math.abs(dx) > 60 && Math.abs(dx) > Math.abs(event.clientY - start.y)) go(dx < 0 ? index + 1 : index - 1);
        }}
      >
        <div className="flex items-start gap-3">
          <TickButton done={done} label={`Step ${step.number} done`} disabled={!canTick} onToggle={() => progress.tick('step', step.id, !done)} />
          <div className="min-w-0 flex-1">
            <p className="text-sm text-ink-soft" aria-live="polite" data-testid="step-position">
              Step {step.number} of {steps.length} · {doneCount} done
            </p>
            <h2 className="text-xl font-semibold text-ink" data-testid="step-title">
              {step.title}
            </h2>
            {who.length > 0 ? (
              <p className="text-xs text-ink-muted">
                Done by {who.map((entry) => `${entry.name}${entry.waiting ? ' (waiting to sync)' : ''}`).join(' and ')}
              </p>
            ) : null}
          </div>
        </div>
        <StepDetails step={step} />
        <div className="mt-auto flex gap-3">
          <Button className="min-h-14 flex-1 text-base" icon={<ChevronLeft aria-hidden className="size-5" />} disabled={index === 0} onClick={() => go(index - 1)}>
            Previous
          </Button>
          <Button className="min-h-14 flex-1 text-base" variant="primary" disabled={index === steps.length - 1} onClick={() => go(index + 1)}>
            Next step <ChevronRight aria-hidden className="size-5" />
          </Button>
        </div>
      </div>
    </div>
  );
}
