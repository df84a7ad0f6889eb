import { useEffect, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { ChevronDown, ChevronUp, ListChecks, Maximize2, Minimize2 } from 'lucide-react';
import { countOf } from '@/domain/words';
import { useCurrentUser } from '@/lib/session/currentUser';
import { cn } from '@/lib/cn';
import { useEditorStore } from '../store/editorStore';
import { FindingsPanel } from '../panels/FindingsPanel';
import { OutputsDock } from '../panels/OutputsDock';
import { OUTPUTS_MIN_HEIGHT, isNarrowWindow, outputsMaxHeight, readOutputsHeight, saveOutputsHeight } from './outputsSize';

export interface OutputsAreaProps {
  /** Full width: the tables cover the whole editor below the top bar (tools, model and inspector). */
  fullWidth: boolean;
  onFullWidthChange: (fullWidth: boolean) => void;
}

/**
 * The bottom area: checks on the left, the output tables on the right. A drag handle (or the
 * arrow keys on it) sets its height, remembered per person; "Full width" lays the tables over the
 * whole editor below the top bar, every column showing, until Escape or the same button; the
 * checks column folds (folded from the start on narrow screens).
 */
export function OutputsArea({ fullWidth: enlarged, onFullWidthChange: setEnlarged }: OutputsAreaProps) {
  const [open, setOpen] = useState(true);
  const userId = useCurrentUser().data?.id;
  const [height, setHeight] = useState(() => readOutputsHeight(userId));
  const fullWidthButton = useRef<HTMLButtonElement>(null);
  // Escape leaves full width before any editor key sees it (capture phase), and focus returns to the toggle.
  useEffect(() => {
    if (!enlarged) return;
    const onKey = (event: globalThis.KeyboardEvent) => {
      if (event.key !== 'Escape') return;
      event.preventDefault();
      event.stopPropagation();
      setEnlarged(false);
      fullWidthButton.current?.focus();
    };
    window.addEventListener('keydown', onKey, true);
    return () => window.removeEventListener('keydown', onKey, true);
  }, [enlarged, setEnlarged]);
  const [checksOpen, setChecksOpen] = useState(() => !isNarrowWindow());
  const drag = useRef<{ y: number; height: number } | null>(null);
  const counts = useEditorStore((state) => state.analysis?.counts);
  const status = useEditorStore((state) => state.analysisStatus);
  const summary = counts ? `${countOf(counts.error, 'error')} · ${countOf(counts.warning, 'warning')} · ${countOf(counts.note, 'note')}` : status === 'running' ? 'Checking…' : '';

  const clamp = (value: number) => Math.min(outputsMaxHeight(), Math.max(OUTPUTS_MIN_HEIGHT, Math.round(value)));
  const commit = (value: number) => {
    const next = clamp(value);
    setHeight(next);
    saveOutputsHeight(userId, next);
  };
  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    event.currentTarget.setPointerCapture(event.pointerId);
    drag.current = { y: event.clientY, height };
    if (enlarged) setEnlarged(false);
  };
  const onPointerMove = (event: PointerEvent<HTMLDivElement>) => {
    if (drag.current) setHeight(clamp(drag.current.height + drag.current.y - event.clientY));
  };
  const onPointerUp = (event: PointerEvent<HTMLDivElement>) => {
    if (!drag.current) return;
    commit(drag.current.height + drag.current.y - event.clientY);
    drag.current = null;
  };
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const step = event.shiftKey ? 96 : 24;
    if (event.key === 'ArrowUp') commit(height + step);
    else if (event.key === 'ArrowDown') commit(height - step);
    else if (event.key === 'Home') commit(OUTPUTS_MIN_HEIGHT);
    else if (event.key === 'End') commit(outputsMaxHeight());
    else return;
    event.preventDefault();
    if (enlarged) setEnlarged(false);
  };
  const shown = height;

  return (
    <section
      aria-label="Checks and outputs"
      data-full-width={enlarged || undefined}
      // In full width the area is laid over the editor's row (tools, model, inspector), which is its positioned container.
      className={cn('flex shrink-0 flex-col border-t border-paper-line bg-paper-raised', enlarged && open && 'absolute inset-0 z-30 border-t-0 shadow-lg')}
    >
      {open && !enlarged ? (
        <div
          role="separator"
          aria-orientation="horizontal"
          aria-label="Outputs height"
          aria-valuenow={shown}
          aria-valuemin={OUTPUTS_MIN_HEIGHT}
          aria-valuemax={outputsMaxHeight()}
          tabIndex={0}
          title="Drag to resize the outputs (or use the arrow keys)"
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={onPointerUp}
          onKeyDown={onKeyDown}
          className="group flex h-3 cursor-row-resize touch-none items-center justify-center focus-ring"
        >
          <span aria-hidden className="h-1 w-12 rounded-full bg-paper-line group-hover:bg-ink-muted" />
        </div>
      ) : null}
      <div className="flex min-h-11 items-center gap-1 pr-2">
        <button
          type="button"
          aria-expanded={open}
          onClick={() => {
            // Folding also leaves full width, so the model and inspector come back.
            if (open && enlarged) setEnlarged(false);
            setOpen(!open);
          }}
          className="flex min-h-11 min-w-0 flex-1 items-center gap-2 px-4 text-left text-sm font-semibold text-ink hover:bg-paper-sunk focus-ring"
        >
          {open ? <ChevronDown aria-hidden className="size-4 shrink-0" /> : <ChevronUp aria-hidden className="size-4 shrink-0" />}
          <span className="whitespace-nowrap">Checks and outputs</span>
          <span className="ml-2 truncate text-xs font-normal tabular-nums text-ink-muted">{summary}</span>
          {status === 'running' ? <span className="ml-auto whitespace-nowrap text-xs font-normal text-ink-muted">Updating…</span> : null}
        </button>
        {open ? (
          <>
            <button
              type="button"
              aria-pressed={checksOpen}
              onClick={() => setChecksOpen((value) => !value)}
              title={checksOpen ? 'Fold the checks column' : 'Show the checks column'}
              className="inline-flex min-h-11 items-center gap-1.5 rounded-lg px-2.5 text-sm text-ink-soft hover:bg-paper-sunk focus-ring"
            >
              <ListChecks aria-hidden className="size-4" />
              Checks
            </button>
            <button
              ref={fullWidthButton}
              type="button"
              aria-pressed={enlarged}
              aria-keyshortcuts={enlarged ? 'Escape' : undefined}
              onClick={() => setEnlarged(!enlarged)}
              title={enlarged ? 'Back to the model (Esc)' : 'Lay the tables over the whole editor, every column showing (Esc leaves)'}
              className={cn('inline-flex min-h-11 items-center gap-1.5 rounded-lg px-2.5 text-sm text-ink-soft hover:bg-paper-sunk focus-ring', enlarged && 'bg-paper-sunk text-ink')}
            >
              {enlarged ? <Minimize2 aria-hidden className="size-4" /> : <Maximize2 aria-hidden className="size-4" />}
              Full width
              {enlarged ? <kbd className="ml-1 rounded border border-paper-line px-1 text-xs font-normal text-ink-muted">Esc</kbd> : null}
            </button>
          </>
        ) : null}
      </div>
      {open ? (
        <div className={cn('flex min-h-0 border-t border-paper-line', enlarged && 'flex-1')} style={enlarged ? undefined : { height: shown }} data-testid="outputs-body">
          {checksOpen && !enlarged ? (
            <div className="w-[clamp(240px,30%,380px)] shrink-0 overflow-y-auto border-r border-paper-line">
              <FindingsPanel />
            </div>
          ) : null}
          <div className={cn('min-w-0 flex-1 overflow-hidden')}>
            <OutputsDock collapsible={false} />
          </div>
        </div>
      ) : null}
    </section>
  );
}
