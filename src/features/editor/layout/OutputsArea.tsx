import { useState } from 'react';
import { ChevronDown, ChevronUp } from 'lucide-react';
import { countOf } from '@/domain/words';
import { useEditorStore } from '../store/editorStore';
import { FindingsPanel } from '../panels/FindingsPanel';
import { OutputsDock } from '../panels/OutputsDock';

/** The bottom dock: checks on the left, bill of materials and the other outputs on the right; folds down to one line. */
export function OutputsArea() {
  const [open, setOpen] = useState(true);
  const counts = useEditorStore((state) => state.analysis?.counts);
  const status = useEditorStore((state) => state.analysisStatus);
  const summary = counts ? `${countOf(counts.error, 'error')} · ${countOf(counts.warning, 'warning')} · ${countOf(counts.note, 'note')}` : status === 'running' ? 'Checking…' : '';
  return (
    <section aria-label="Checks and outputs" className="flex shrink-0 flex-col border-t border-paper-line bg-paper-raised">
      <button
        type="button"
        aria-expanded={open}
        onClick={() => setOpen((value) => !value)}
        className="flex min-h-11 items-center gap-2 px-4 text-left text-sm font-semibold text-ink hover:bg-paper-sunk focus-ring"
      >
        {open ? <ChevronDown aria-hidden className="size-4" /> : <ChevronUp aria-hidden className="size-4" />}
        Checks and outputs
        <span className="ml-2 text-xs font-normal tabular-nums text-ink-muted">{summary}</span>
        {status === 'running' ? <span className="ml-auto text-xs font-normal text-ink-muted">Updating…</span> : null}
      </button>
      {open ? (
        <div className="flex h-[260px] min-h-0 border-t border-paper-line">
          <div className="w-[380px] shrink-0 overflow-y-auto border-r border-paper-line">
            <FindingsPanel />
          </div>
          <div className="min-w-0 flex-1 overflow-hidden">
            <OutputsDock collapsible={false} />
          </div>
        </div>
      ) : null}
    </section>
  );
}
