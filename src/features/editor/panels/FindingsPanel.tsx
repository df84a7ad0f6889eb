import { useState } from 'react';
import { CircleCheck, LoaderCircle, Wrench } from 'lucide-react';
import type { Finding, Severity } from '@/domain/analysis/types';
import { operationCommand } from '@/features/editor/commands';
import { useEditorStore } from '@/features/editor/store/editorStore';
import { cn } from '@/lib/cn';
import { SEVERITY_META, SEVERITY_ORDER } from './severity';

const CHECK_NAMES: Record<string, string> = {
  joints: 'Joints',
  'panel-fit': 'Panel fit',
  interference: 'Clashes',
  sequence: 'Build order',
  structure: 'Loads',
};

/** How many findings of one severity are listed before a "show all" button (large frames yield thousands). */
const FIRST_PAGE = 100;

function countWords(counts: Record<Severity, number>): string {
  return SEVERITY_ORDER.map((severity) => `${counts[severity]} ${counts[severity] === 1 ? SEVERITY_META[severity].word.toLowerCase() : SEVERITY_META[severity].plural.toLowerCase()}`).join(' · ');
}

/** Findings of the live checks, by severity; clicking one selects and frames its parts, "Fix" applies the suggested change. */
export function FindingsPanel() {
  const analysis = useEditorStore((state) => state.analysis);
  const status = useEditorStore((state) => state.analysisStatus);
  const selection = useEditorStore((state) => state.selection);
  const select = useEditorStore((state) => state.select);
  const requestFrame = useEditorStore((state) => state.requestFrame);
  const execute = useEditorStore((state) => state.execute);
  const setHovered = useEditorStore((state) => state.setHovered);
  const [expanded, setExpanded] = useState<Partial<Record<Severity, boolean>>>({});

  const findings = analysis?.findings ?? [];
  const counts: Record<Severity, number> = { error: 0, warning: 0, note: 0 };
  for (const finding of findings) counts[finding.severity] += 1;
  const running = status === 'running';

  function show(finding: Finding) {
    if (finding.partIds.length === 0) return;
    select(finding.partIds, 'replace');
    requestFrame(finding.partIds);
  }

  return (
    <section aria-labelledby="findings-heading" aria-busy={running} className="flex h-full min-h-0 flex-col bg-paper-raised">
      <header className="flex items-center gap-2 border-b border-paper-line px-3 py-2">
        <h2 id="findings-heading" className="text-sm font-semibold">Checks</h2>
        {analysis && <span className="text-xs tabular-nums text-ink-soft">{countWords(counts)}</span>}
        {running && (
          <span role="status" className="ml-auto flex items-center gap-1 text-xs text-ink-muted">
            <LoaderCircle aria-hidden="true" className="h-3.5 w-3.5 animate-spin text-accent" />
            Checking…
          </span>
        )}
      </header>
      <div className={cn('min-h-0 flex-1 overflow-auto p-2', running && analysis && 'opacity-60')}>
        {!analysis && <p className="p-2 text-sm text-ink-muted">{running ? 'Checking the design…' : 'Checks run when the design loads.'}</p>}
        {analysis && findings.length === 0 && (
          <p className="flex items-center gap-2 rounded bg-severity-ok-soft p-3 text-sm text-severity-ok">
            <CircleCheck aria-hidden="true" className="h-5 w-5" />
            <span>
              <strong>All clear.</strong> No errors, warnings or notes in this design.
            </span>
          </p>
        )}
        {SEVERITY_ORDER.filter((severity) => counts[severity] > 0).map((severity) => {
          const meta = SEVERITY_META[severity];
          const group = findings.filter((finding) => finding.severity === severity);
          const visible = expanded[severity] ? group : group.slice(0, FIRST_PAGE);
          return (
            <section key={severity} aria-label={`${meta.plural} (${group.length})`} className="mb-3">
              <h3 className={cn('flex items-center gap-1.5 px-1 py-1 text-sm font-semibold', meta.text)}>
                <meta.Icon aria-hidden="true" className="h-4 w-4" />
                {meta.plural}
                <span className="tabular-nums">({group.length})</span>
              </h3>
              <ul className="flex flex-col gap-1">
                {visible.map((finding) => {
                  const isSelected = finding.partIds.length > 0 && finding.partIds.every((id) => selection.includes(id));
                  return (
                    <li key={finding.id} className={cn('flex items-start gap-1 rounded border-l-4', meta.soft, isSelected ? 'border-accent' : 'border-transparent')}>
                      <button
                        type="button"
                        onClick={() => show(finding)}
                        onMouseEnter={() => setHovered(finding.partIds[0] ?? null)}
                        onMouseLeave={() => setHovered(null)}
                        aria-current={isSelected ? 'true' : undefined}
                        className="flex min-h-[44px] flex-1 items-start gap-2 rounded p-2 text-left text-sm focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
                      >
                        <meta.Icon aria-hidden="true" className={cn('mt-0.5 h-4 w-4 shrink-0', meta.text)} />
                        <span>
                          <span className={cn('font-semibold', meta.text)}>{meta.word}:</span> {finding.message}{' '}
                          <span className="block text-xs text-ink-muted">
                            {CHECK_NAMES[finding.check] ?? finding.check}
                            {finding.partIds.length > 0 && ` · ${finding.partIds.join(', ')}`}
                          </span>
                        </span>
                      </button>
                      {finding.fix && (
                        <button
                          type="button"
                          onClick={() => execute(operationCommand(finding.fix!.label, finding.fix!.operation))}
                          aria-label={`Fix: ${finding.fix.label}`}
                          title={finding.fix.label}
                          className="m-1 inline-flex min-h-[44px] shrink-0 items-center gap-1 rounded border border-accent px-2 text-xs font-semibold text-accent-strong hover:bg-accent-soft focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
                        >
                          <Wrench aria-hidden="true" className="h-3.5 w-3.5" />
                          Fix
                        </button>
                      )}
                    </li>
                  );
                })}
              </ul>
              {group.length > visible.length && (
                <button
                  type="button"
                  onClick={() => setExpanded((current) => ({ ...current, [severity]: true }))}
                  className="mt-1 min-h-[44px] px-2 text-sm text-accent-strong underline focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
                >
                  Show all {group.length} {meta.plural.toLowerCase()}
                </button>
              )}
            </section>
          );
        })}
      </div>
    </section>
  );
}
