import { useId, useMemo, useState } from 'react';
import { SquareDashed } from 'lucide-react';
import { defaultCatalogue, getPanelMaterial } from '@/domain/catalogue';
import type { PanelInput } from '@/domain/design/operations';
import { findOpenings, type FrameOpening } from '@/domain/design/openings';
import type { Panel, Vec3 } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import { Button } from '@/components/ui';
import { cn } from '@/lib/cn';
import { operationCommand } from '../commands/operationCommand';
import { executeAndSelectAdded } from '../hooks/useSelectionActions';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { InspectorSection, InspectorSelect } from './InspectorSection';
import { LengthInput } from './LengthInput';
import { capturedThicknessProblem, panelSystem } from './panelRules';

const AXIS_INDEX = { x: 0, y: 1, z: 2 } as const;

/** The fill tool: the frame's open rectangles (pick one here or in the model) and the panel to drop into it. */
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
      {picked ? <FillForm key={picked.id} opening={picked} /> : open.length > 0 ? <p className="px-4 py-3 text-sm text-ink-soft">Pick an opening in the list or in the model.</p> : null}
    </>
  );
}

function FillForm({ opening }: { opening: FrameOpening }) {
  const store = useEditorStoreApi();
  const design = useEditorStore((state) => state.design);
  const units = useEditorStore((state) => state.units);
  const catalogue = defaultCatalogue;
  const system = panelSystem(design, { boundedBy: opening.boundedBy });
  const materialId = useId();
  const mountingId = useId();
  const roleId = useId();
  const [material, setMaterial] = useState(catalogue.panelMaterials[0]?.id ?? 'acrylic');
  const [mounting, setMounting] = useState<Panel['mounting']>('captured');
  const [role, setRole] = useState<Panel['role']>('panel');
  const [thickness, setThickness] = useState(() => fittingThickness(getPanelMaterial(catalogue, material)?.thicknesses ?? [3], system?.slotOpening));
  const [error, setError] = useState<string | null>(null);
  const thicknessProblem = mounting === 'captured' ? capturedThicknessProblem(thickness, system, units) : null;

  const fill = () => {
    if (thicknessProblem) return setError(thicknessProblem);
    const panel: PanelInput = { materialId: material, thickness, mounting, role, boundedBy: [...opening.boundedBy], rect: panelRect(opening, mounting, thickness, system?.outerSize ?? 40) };
    const applied = executeAndSelectAdded(store, operationCommand(`Fill opening with ${getPanelMaterial(catalogue, material)?.name ?? material}`, { type: 'addPanel', payload: { panel } }));
    if (!applied) return setError(store.getState().lastRefusal?.message ?? 'The panel was refused.');
    setError(null);
    // Back to picking, so the inspector shows the new panel (material, thickness, cut-outs).
    store.getState().setTool('select');
  };

  return (
    <InspectorSection title="Panel for this opening">
      <InspectorSelect
        id={materialId}
        label="Material"
        value={material}
        onChange={(value) => {
          setMaterial(value);
          setThickness(fittingThickness(getPanelMaterial(catalogue, value)?.thicknesses ?? [thickness], system?.slotOpening));
        }}
      >
        {catalogue.panelMaterials.map((option) => (
          <option key={option.id} value={option.id}>
            {option.name}
          </option>
        ))}
      </InspectorSelect>
      <LengthInput
        label="Thickness"
        valueMm={thickness}
        units={units}
        validate={(mm) => (mounting === 'captured' ? capturedThicknessProblem(mm, system, units) : null)}
        onCommit={(mm) => setThickness(mm)}
      />
      <div className="grid grid-cols-2 gap-2">
        <InspectorSelect id={mountingId} label="Mounting" value={mounting} onChange={(value) => setMounting(value as Panel['mounting'])}>
          <option value="captured">In the slots</option>
          <option value="face">On the face</option>
        </InspectorSelect>
        <InspectorSelect id={roleId} label="Role" value={role} onChange={(value) => setRole(value as Panel['role'])}>
          <option value="panel">Panel</option>
          <option value="door">Door</option>
          <option value="shelf">Shelf</option>
        </InspectorSelect>
      </div>
      {error || thicknessProblem ? (
        <p role="alert" className="text-xs text-severity-error">
          <span className="font-semibold">Cannot fill: </span>
          {error ?? thicknessProblem}
        </p>
      ) : null}
      <Button variant="primary" icon={<SquareDashed aria-hidden className="size-4" />} onClick={fill}>
        Fill opening
      </Button>
      {mounting === 'captured' ? <p className="text-xs text-ink-muted">A captured panel goes in before the last profile of its frame closes the slot.</p> : null}
    </InspectorSection>
  );
}

/** The thickest common thickness that fits the slot (or the thinnest listed when none does). */
function fittingThickness(thicknesses: number[], slotOpening: number | undefined): number {
  const sorted = [...thicknesses].sort((a, b) => a - b);
  if (slotOpening === undefined) return sorted[0] ?? 3;
  const fitting = sorted.filter((t) => t <= slotOpening - 0.5);
  return fitting[fitting.length - 1] ?? sorted[0] ?? 3;
}

/** A captured panel uses the clear opening; a face-mounted sheet covers to the profiles' centre lines and sits on their face. */
function panelRect(opening: FrameOpening, mounting: Panel['mounting'], thickness: number, sectionSize: number): Panel['rect'] {
  if (mounting === 'captured') return { ...opening.rect, center: [...opening.rect.center] as Vec3 };
  const center = [...opening.rect.center] as Vec3;
  center[AXIS_INDEX[opening.rect.normal]] += sectionSize / 2 + thickness / 2;
  return { ...opening.rect, center, width: opening.rect.width + sectionSize, height: opening.rect.height + sectionSize };
}
