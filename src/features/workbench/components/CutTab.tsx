import type { DesignAnalysis } from '@/domain/analysis/types';
import type { DesignDocument } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import type { BuildProgress } from '../hooks/useBuildProgress';
import { TickButton } from './TickButton';

/** The cut list laid out bar by bar as the stock plan cuts them; each piece is ticked as cut. */
export function CutTab({ design, analysis, progress, canTick }: { design: DesignDocument; analysis: DesignAnalysis; progress: BuildProgress; canTick: boolean }) {
  const pieces = new Map(analysis.cutList.map((item) => [item.id, item]));
  const length = (mm: number) => formatLength(mm, design.units);
  return (
    <div className="flex flex-col gap-6">
      <p className="rounded-lg bg-severity-warning-soft px-4 py-3 text-sm text-ink">
        Wear eye and hearing protection at the saw and when drilling or tapping; clamp the profile. Common practice; follow your local rules.
      </p>
      {analysis.stockPlans.map(({ variantId, plan }) => (
        <section key={variantId} aria-label={`Stock bars of ${variantId}`} className="flex flex-col gap-3">
          <h2 className="text-lg font-semibold text-ink">
            {variantId}: {plan.barCount} {plan.barCount === 1 ? 'bar' : 'bars'} of {length(design.settings.stockLength)}
          </h2>
          {plan.bars.map((bar) => (
            <div key={bar.index} className="rounded-card border border-paper-line bg-paper-raised">
              <h3 className="border-b border-paper-line px-4 py-2 text-sm font-semibold text-ink-soft">
                Bar {bar.index + 1} · offcut {length(bar.offcut)}
                {bar.reusable ? ' (keep)' : ''}
              </h3>
              <ul className="divide-y divide-paper-line">
                {bar.cuts.map((cut) => {
                  const piece = pieces.get(cut.id);
                  const done = progress.isDone('cut', cut.id);
                  const who = progress.whoTicked('cut', cut.id);
                  return (
                    <li key={cut.id} className="flex items-center gap-3 px-4 py-2" data-testid={`cut-piece-${cut.id}`}>
                      <TickButton done={done} label={`${cut.id} cut`} disabled={!canTick} onToggle={() => progress.tick('cut', cut.id, !done)} />
                      <div className="flex min-w-0 flex-1 flex-col">
                        <span className="font-semibold text-ink">
                          {cut.id} · <span className="tabular-nums">{length(cut.length)}</span>
                          {piece?.tolerance ? <span className="text-ink-muted"> ±{length(piece.tolerance)}</span> : null}
                        </span>
                        <span className="text-sm text-ink-soft">{piece?.label}</span>
                        {piece && [piece.ends.start, piece.ends.end].some((end) => end.kind !== 'plain') ? (
                          <span className="text-sm text-ink">
                            {[piece.ends.start, piece.ends.end].filter((end) => end.kind !== 'plain').map((end) => end.description).join('; ')}
                          </span>
                        ) : null}
                        {piece?.machining.filter((op) => op.kind !== 'end-tap').map((op) => (
                          <span key={op.id} className="text-sm text-ink">
                            {op.description}
                          </span>
                        ))}
                        {who.length > 0 ? <span className="text-xs text-ink-muted">Cut by {who.map((entry) => entry.name).join(', ')}</span> : null}
                      </div>
                    </li>
                  );
                })}
              </ul>
            </div>
          ))}
        </section>
      ))}
    </div>
  );
}
