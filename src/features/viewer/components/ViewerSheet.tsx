import { useRef, useState, type ReactNode } from 'react';
import { ChevronUp } from 'lucide-react';

interface ViewerSheetProps {
  /** Always visible at the sheet's top: the step controls (required). */
  header: ReactNode;
  /** Shown when the sheet is pulled up: steps and tables (required). */
  children: ReactNode;
}

/** Heights of the sheet's body when pulled up, as a share of the window height. */
const OPEN_SHARE = 0.36;

/**
 * The phone and tablet sheet under the canvas: the player's controls stay in reach; pull the
 * handle up (drag or tap) to see the steps and the tables, pull it down to give the canvas back.
 * The height is written to the element while dragging (no React render per move).
 */
export function ViewerSheet({ header, children }: ViewerSheetProps) {
  const [open, setOpen] = useState(false);
  const body = useRef<HTMLDivElement>(null);
  const drag = useRef<{ y: number; start: number; moved: boolean } | null>(null);

  const openHeight = () => Math.round(window.innerHeight * OPEN_SHARE);
  return (
    <section aria-label="Steps and parts" className="flex shrink-0 flex-col border-t border-paper-line bg-paper-raised shadow-[0_-4px_16px_rgba(0,0,0,0.08)]" data-testid="viewer-sheet">
      <button
        type="button"
        aria-expanded={open}
        aria-controls="viewer-sheet-body"
        onClick={() => {
          if (drag.current?.moved) return;
          setOpen((o) => !o);
        }}
        onPointerDown={(e) => {
          drag.current = { y: e.clientY, start: open ? openHeight() : 0, moved: false };
          e.currentTarget.setPointerCapture(e.pointerId);
        }}
        onPointerMove={(e) => {
          const d = drag.current;
          const el = body.current;
          if (!d || !el) return;
          const delta = d.y - e.clientY;
          if (Math.abs(delta) > 6) d.moved = true;
          if (!d.moved) return;
          el.style.display = 'block';
          el.style.height = `${Math.max(0, Math.min(openHeight(), d.start + delta))}px`;
        }}
        onPointerUp={(e) => {
          const d = drag.current;
          const el = body.current;
          if (d?.moved && el) {
            const shown = el.getBoundingClientRect().height;
            el.style.height = '';
            el.style.display = '';
            setOpen(shown > openHeight() / 3);
          }
          window.setTimeout(() => {
            drag.current = null;
          }, 0);
          void e;
        }}
        className="flex min-h-[44px] w-full touch-none flex-col items-center justify-center gap-0.5 focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
      >
        <span aria-hidden className="h-1 w-10 rounded-full bg-ink-muted/40" />
        <span className="flex items-center gap-1 text-xs font-medium text-ink-soft">
          <ChevronUp aria-hidden className={`size-4 transition-transform ${open ? 'rotate-180' : ''}`} />
          {open ? 'Pull down for the model' : 'Pull up for steps and parts'}
        </span>
      </button>
      <div className="px-3 pb-2">{header}</div>
      <div id="viewer-sheet-body" ref={body} className={`${open ? 'block' : 'hidden'} overflow-y-auto overscroll-contain px-3 pb-3`} style={open ? { height: `${OPEN_SHARE * 100}vh` } : undefined}>
        {children}
      </div>
    </section>
  );
}
