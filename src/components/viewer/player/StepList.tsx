import type { StepPlayerState } from './useStepPlayer';

interface StepListProps {
  /** The player (required; from useStepPlayer). */
  player: StepPlayerState;
}

/** The steps by title, in order; the current one is marked; a click goes to that step. */
export function StepList({ player }: StepListProps) {
  const { view } = player;
  return (
    <ol className="flex flex-col gap-1" aria-label="Assembly steps">
      {view.steps.map((step, i) => (
        <li key={step.id}>
          <button
            type="button"
            onClick={() => player.goTo(i)}
            aria-current={i === view.stepIndex ? 'step' : undefined}
            className={`flex min-h-[44px] w-full items-start gap-2 rounded-md px-2 py-1.5 text-left text-sm focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent ${
              i === view.stepIndex ? 'bg-accent-soft font-semibold text-accent-strong' : i < view.stepIndex ? 'text-ink' : 'text-ink-muted'
            }`}
          >
            <span className="w-6 shrink-0 text-right tabular-nums">{i + 1}.</span>
            <span className="min-w-0">
              {step.title}
              {step.partIds.length > 0 ? (
                <span className="font-normal text-ink-muted">
                  {' '}
                  · {step.partIds.length} {step.partIds.length === 1 ? 'part' : 'parts'}
                </span>
              ) : null}
            </span>
          </button>
        </li>
      ))}
    </ol>
  );
}
