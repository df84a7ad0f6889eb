import { KeyRound } from 'lucide-react';
import type { DesignAnalysis } from '@/domain/analysis/types';
import { kitItemKey } from '../hooks/useBuildData';
import type { BuildProgress } from '../hooks/useBuildProgress';
import { TickButton } from './TickButton';

const GROUPS: { category: string; title: string }[] = [
  { category: 'connector', title: 'Connectors' },
  { category: 'fastener', title: 'Fasteners' },
  { category: 't-nut', title: 'T-nuts' },
  { category: 'panel', title: 'Panels' },
  { category: 'accessory', title: 'Accessories' },
  { category: 'gasket', title: 'Gaskets' },
  { category: 'slot-cover', title: 'Slot covers' },
];

/** Everything to gather before assembly, hex keys first; each line is ticked as gathered. */
export function KitTab({ analysis, progress, canTick }: { analysis: DesignAnalysis; progress: BuildProgress; canTick: boolean }) {
  const hexKeys = analysis.tools.filter((tool) => tool.kind === 'hex-key');
  const otherTools = analysis.tools.filter((tool) => tool.kind !== 'hex-key');
  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="kit-hex-keys" className="rounded-card border-2 border-accent bg-paper-raised p-4">
        <h2 id="kit-hex-keys" className="mb-2 flex items-center gap-2 text-lg font-semibold text-ink">
          <KeyRound aria-hidden className="size-5" /> Hex keys
        </h2>
        <ul className="flex flex-col gap-2">
          {hexKeys.map((tool) => {
            const key = `tool:${tool.id}`;
            const done = progress.isDone('kit', key);
            return (
              <li key={tool.id} className="flex items-center gap-3">
                <TickButton done={done} label={`${tool.name} gathered`} disabled={!canTick} onToggle={() => progress.tick('kit', key, !done)} />
                <span>
                  <strong className="text-xl">{tool.size}</strong> {tool.name} <span className="text-sm text-ink-soft">— {tool.reason}</span>
                </span>
              </li>
            );
          })}
          {hexKeys.length === 0 ? <li className="text-sm text-ink-soft">No screws here need a hex key.</li> : null}
        </ul>
        {otherTools.length > 0 ? <p className="mt-3 text-sm text-ink-soft">Also: {otherTools.map((tool) => tool.name).join(', ')}.</p> : null}
      </section>
      {GROUPS.map(({ category, title }) => {
        const lines = analysis.bom.filter((line) => line.category === category);
        if (lines.length === 0) return null;
        return (
          <section key={category} aria-label={title} className="rounded-card border border-paper-line bg-paper-raised">
            <h2 className="border-b border-paper-line px-4 py-2 text-lg font-semibold text-ink">{title}</h2>
            <ul className="divide-y divide-paper-line">
              {lines.map((line) => {
                const key = kitItemKey(line);
                const done = progress.isDone('kit', key);
                return (
                  <li key={key} className="flex items-center gap-3 px-4 py-2">
                    <TickButton done={done} label={`${line.description} gathered`} disabled={!canTick} onToggle={() => progress.tick('kit', key, !done)} />
                    <span className="w-20 shrink-0 text-right text-xl font-semibold tabular-nums">
                      {line.quantity} <span className="text-sm font-normal">{line.unit}</span>
                    </span>
                    <span className="min-w-0 flex-1">
                      {line.description} <span className="text-xs text-ink-muted">{line.code}</span>
                    </span>
                  </li>
                );
              })}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
