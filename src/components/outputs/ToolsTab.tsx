import type { ToolItem, ToolKind } from '@/domain/analysis/types';

const TOOL_KIND_NAMES: Record<ToolKind, string> = {
  'hex-key': 'Hex keys',
  drill: 'Drills',
  tap: 'Taps',
  mallet: 'Mallet',
  square: 'Measuring and squaring',
  saw: 'Saw',
  other: 'Other tools',
};
const ORDER: ToolKind[] = ['hex-key', 'drill', 'tap', 'saw', 'mallet', 'square', 'other'];

/** The build's tools, grouped by kind, with the size and the standard it comes from. */
export function ToolsTab({ tools }: { tools: ToolItem[] }) {
  if (tools.length === 0) return <p className="text-sm text-ink-muted">No tools needed yet: add joints or machining.</p>;
  const kinds = ORDER.filter((kind) => tools.some((tool) => tool.kind === kind));
  return (
    <div className="flex flex-col gap-3">
      {kinds.map((kind) => (
        <section key={kind} aria-labelledby={`tools-${kind}`}>
          <h3 id={`tools-${kind}`} className="text-sm font-semibold">
            {TOOL_KIND_NAMES[kind]}
          </h3>
          <table className="w-full text-sm">
            <caption className="sr-only">{TOOL_KIND_NAMES[kind]}</caption>
            <thead>
              <tr className="border-b border-paper-line text-ink-soft">
                <th scope="col" className="px-2 py-1 text-left font-medium">Tool</th>
                <th scope="col" className="px-2 py-1 text-right font-medium">Size</th>
                <th scope="col" className="px-2 py-1 text-left font-medium">Standard</th>
                <th scope="col" className="px-2 py-1 text-left font-medium">Needed for</th>
              </tr>
            </thead>
            <tbody>
              {tools
                .filter((tool) => tool.kind === kind)
                .map((tool) => (
                  <tr key={tool.id} className="border-b border-paper-line/60">
                    <td className="px-2 py-1">{tool.name}</td>
                    <td className="px-2 py-1 text-right tabular-nums whitespace-nowrap">{tool.size ?? '—'}</td>
                    <td className="px-2 py-1 text-xs">{tool.standard ?? '—'}</td>
                    <td className="px-2 py-1 text-xs text-ink-soft">{tool.reason}</td>
                  </tr>
                ))}
            </tbody>
          </table>
        </section>
      ))}
    </div>
  );
}
