import { useMemo } from 'react';
import { findOpenings } from '@/domain/design/openings';
import { formatLength } from '@/domain/units';
import { cn } from '@/lib/cn';
import { useEditorStore } from '../store/editorStore';
import { FillOpeningForm } from './FillOpeningForm';
import { InspectorSection } from './InspectorSection';

/** The fill tool: the frame's open rectangles (pick one here or in the model) and the panel or doors to put in it. */
export function FillOpeningInspector() {
  const design = useEditorStore((state) => state.design);
  const pickedId = useEditorStore((state) => state.pickedOpeningId);
  const pickOpening = useEditorStore((state) => state.pickOpening);
  const units = useEditorStore((state) => state.units);
  const openings = useMemo(() => findOpenings(design), [design]);
  const filled = useMemo(() => new Set(design.panels.map((panel) => [...(panel.boundedBy ?? [])].sort().join('+'))), [design.panels]);
  const open = openings.filter((opening) => !filled.has([...opening.boundedBy].sort().join('+')));
  const picked = open.find((opening) => opening.id === pickedId) ?? null;

  return (
    <>
      <InspectorSection title={`Open rectangles (${open.length})`}>
        {open.length === 0 ? (
          <p className="text-sm text-ink-muted">No empty rectangle of four profiles in one plane. Draw a closed frame first.</p>
        ) : (
          <ul className="flex flex-col gap-1" aria-label="Openings">
            {open.map((opening, index) => (
              <li key={opening.id}>
                <button
                  type="button"
                  aria-pressed={opening.id === pickedId}
                  onClick={() => pickOpening(opening.id === pickedId ? null : opening.id)}
                  className={cn(
                    'flex min-h-11 w-full items-center justify-between gap-2 rounded-lg border px-3 text-left text-sm focus-ring',
                    opening.id === pickedId ? 'border-accent bg-accent-soft text-accent-strong' : 'border-paper-line hover:bg-paper-sunk',
                  )}
                >
                  <span>
                    Opening {index + 1} <span className="text-ink-muted">facing {opening.rect.normal.toUpperCase()}</span>
                  </span>
                  <span className="tabular-nums">
                    {formatLength(opening.rect.width, units)} × {formatLength(opening.rect.height, units)}
                  </span>
                </button>
              </li>
            ))}
          </ul>
        )}
      </InspectorSection>
      {picked ? <FillOpeningForm key={picked.id} opening={picked} /> : open.length > 0 ? <p className="px-4 py-3 text-sm text-ink-soft">Pick an opening in the list or in the model.</p> : null}
    </>
  );
}
