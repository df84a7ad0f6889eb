import { ChevronLeft, ChevronRight, Pause, Play } from 'lucide-react';
import type { StepPlayerState } from './useStepPlayer';

interface StepPlayerControlsProps {
  /** The player (required; from useStepPlayer). */
  player: StepPlayerState;
  /** Extra class names (default none). */
  className?: string;
}

const BUTTON =
  'inline-flex min-h-[44px] min-w-[44px] items-center justify-center gap-1 rounded-md border border-paper-line bg-paper-raised px-2 text-sm font-medium text-ink hover:border-accent hover:text-accent-strong focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent disabled:opacity-40';

/**
 * Play, pause, previous, next and a scrub bar over the steps, the current step's title, and the
 * global explode slider and ghost toggle. Large touch targets; arrows and space work through
 * usePlayerKeys.
 */
export function StepPlayerControls({ player, className }: StepPlayerControlsProps) {
  const { view, playing } = player;
  const count = view.steps.length;
  const step = view.steps[view.stepIndex];
  return (
    <div className={`flex flex-col gap-2 ${className ?? ''}`} role="group" aria-label="Assembly steps player" data-testid="step-player">
      <div className="flex items-center gap-1">
        <button type="button" className={BUTTON} onClick={player.previous} disabled={view.stepIndex <= 0} aria-label="Previous step" title="Previous step (←)">
          <ChevronLeft aria-hidden className="size-5" />
        </button>
        <button type="button" className={`${BUTTON} px-3`} onClick={player.togglePlay} aria-label={playing ? 'Pause' : 'Play'} title={playing ? 'Pause (space)' : 'Play (space)'}>
          {playing ? <Pause aria-hidden className="size-5" /> : <Play aria-hidden className="size-5" />}
          <span>{playing ? 'Pause' : 'Play'}</span>
        </button>
        <button type="button" className={BUTTON} onClick={player.next} disabled={view.stepIndex >= count - 1} aria-label="Next step" title="Next step (→)">
          <ChevronRight aria-hidden className="size-5" />
        </button>
        <label className="ml-2 flex min-w-0 flex-1 items-center">
          <span className="sr-only">Step</span>
          <input
            type="range"
            min={1}
            max={Math.max(1, count)}
            step={1}
            value={view.stepIndex + 1}
            onChange={(e) => player.goTo(Number(e.target.value) - 1)}
            className="h-11 w-full min-w-0 accent-[var(--color-accent,#0b7a75)]"
            aria-valuetext={step ? `Step ${view.stepIndex + 1} of ${count}: ${step.title}` : 'No steps'}
          />
        </label>
      </div>
      <p className="min-w-0 text-sm text-ink" aria-live="polite" data-testid="current-step">
        <span className="font-semibold tabular-nums">
          Step {count === 0 ? 0 : view.stepIndex + 1} of {count}
        </span>
        {step ? <span className="text-ink-soft"> · {step.title}</span> : null}
      </p>
      {step?.caution ? <p className="rounded-md bg-severity-warning/10 px-2 py-1 text-sm text-ink">Caution: {step.caution}</p> : null}
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm text-ink-soft">
        <label className="flex min-h-[44px] items-center gap-2">
          <input type="checkbox" checked={view.ghostLater} onChange={(e) => player.setGhostLater(e.target.checked)} className="size-4" />
          Show later steps faintly
        </label>
        <label className="flex min-h-[44px] min-w-[12rem] flex-1 items-center gap-2">
          Explode
          <input
            type="range"
            min={0}
            max={100}
            value={Math.round(view.explode * 100)}
            onChange={(e) => player.setExplode(Number(e.target.value) / 100)}
            className="h-11 min-w-0 flex-1"
            aria-label="Explode the finished piece"
          />
        </label>
      </div>
    </div>
  );
}
