import { useId, useState, type ReactNode } from 'react';
import { Columns2, DoorClosed, SquareDashed } from 'lucide-react';
import { defaultCatalogue, getPanelMaterial } from '@/domain/catalogue';
import type { DesignOperation, PanelInput } from '@/domain/design/operations';
import { panelRectForOpening, type FrameOpening } from '@/domain/design/openings';
import type { Panel } from '@/domain/design/schema';
import { Button } from '@/components/ui';
import { cn } from '@/lib/cn';
import { panelSlotLimits, thickestFittingThickness } from '@/domain/design/slotLimits';
import { operationCommand } from '../commands/operationCommand';
import { executeAndSelectAdded } from '../hooks/useSelectionActions';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { InspectorSection, InspectorSelect } from './InspectorSection';
import { LengthInput } from './LengthInput';
import { capturedThicknessProblem, panelSystem } from './panelRules';

/** A door sheet this thick or the next listed one up (common practice, no source). */
const PREFERRED_DOOR_THICKNESS_MM = 4;

type FillKind = 'panel' | 'sliding-doors' | 'hinged-door';

const FILL_KINDS: { kind: FillKind; label: string; hint: string; icon: ReactNode; action: string }[] = [
  { kind: 'panel', label: 'Plain panel', hint: 'One sheet, in the slots or on the face', icon: <SquareDashed aria-hidden className="size-4" />, action: 'Fill opening' },
  { kind: 'sliding-doors', label: 'Sliding doors', hint: 'Two overlapping leaves on a track along the top and bottom rails, a handle on each', icon: <Columns2 aria-hidden className="size-4" />, action: 'Add sliding doors' },
  { kind: 'hinged-door', label: 'Hinged door', hint: 'One leaf on two hinges, with a handle and a latch', icon: <DoorClosed aria-hidden className="size-4" />, action: 'Add hinged door' },
];

/** What to put in a picked opening: a plain panel, two sliding doors or a hinged door; each is one undoable command. */
export function FillOpeningForm({ opening }: { opening: FrameOpening }) {
  const store = useEditorStoreApi();
  const design = useEditorStore((state) => state.design);
  const units = useEditorStore((state) => state.units);
  const catalogue = defaultCatalogue;
  const system = panelSystem(design, { boundedBy: opening.boundedBy });
  const slot = panelSlotLimits(design, opening.boundedBy);
  const materialId = useId();
  const mountingId = useId();
  const roleId = useId();
  const hingeId = useId();
  const [kind, setKind] = useState<FillKind>('panel');
  const [material, setMaterial] = useState(catalogue.panelMaterials[0]?.id ?? 'acrylic');
  const [mounting, setMounting] = useState<Panel['mounting']>('captured');
  const [role, setRole] = useState<Panel['role']>('panel');
  const [hingeSide, setHingeSide] = useState<'left' | 'right'>('left');
  const listedThicknesses = (id: string) => getPanelMaterial(catalogue, id)?.thicknesses ?? [3];
  const thicknessFor = (nextKind: FillKind, id: string) =>
    nextKind === 'panel' ? fittingThickness(listedThicknesses(id), slot?.slotOpening) : doorThickness(listedThicknesses(id));
  const [thickness, setThickness] = useState(() => thicknessFor('panel', material));
  const [error, setError] = useState<string | null>(null);
  const captured = kind === 'panel' && mounting === 'captured';
  const thicknessProblem = captured ? capturedThicknessProblem(thickness, slot, units) : null;
  const choice = FILL_KINDS.find((option) => option.kind === kind)!;
  const materialName = getPanelMaterial(catalogue, material)?.name ?? material;

  const operation = (): { label: string; op: DesignOperation } => {
    const at = { boundedBy: [...opening.boundedBy], rect: opening.rect };
    if (kind === 'sliding-doors') {
      return { label: `Add sliding doors of ${materialName}`, op: { type: 'addSlidingDoors', payload: { doors: { opening: at, materialId: material, thickness } } } };
    }
    if (kind === 'hinged-door') {
      return { label: `Add a hinged door of ${materialName}`, op: { type: 'addHingedDoor', payload: { door: { opening: at, materialId: material, thickness, hingeSide } } } };
    }
    const panel: PanelInput = { materialId: material, thickness, mounting, role, boundedBy: [...opening.boundedBy], rect: panelRectForOpening(opening, mounting, thickness, system?.outerSize ?? 40) };
    return { label: `Fill opening with ${materialName}`, op: { type: 'addPanel', payload: { panel } } };
  };

  const fill = () => {
    if (thicknessProblem) return setError(thicknessProblem);
    const { label, op } = operation();
    const applied = executeAndSelectAdded(store, operationCommand(label, op));
    if (!applied) return setError(store.getState().lastRefusal?.message ?? 'The opening could not be filled.');
    setError(null);
    // Back to picking, so the inspector shows what was added.
    store.getState().setTool('select');
  };

  return (
    <InspectorSection title="Fill this opening">
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 text-xs font-medium text-ink-soft">Put in</legend>
        {FILL_KINDS.map((option) => (
          <label
            key={option.kind}
            className={cn(
              'flex min-h-11 cursor-pointer items-start gap-2 rounded-lg border px-3 py-2 text-sm focus-within:ring-2 focus-within:ring-accent',
              option.kind === kind ? 'border-accent bg-accent-soft text-accent-strong' : 'border-paper-line hover:bg-paper-sunk',
            )}
          >
            <input
              type="radio"
              name={`fill-kind-${opening.id}`}
              value={option.kind}
              checked={option.kind === kind}
              onChange={() => {
                setKind(option.kind);
                setThickness(thicknessFor(option.kind, material));
                setError(null);
              }}
              className="mt-0.5 size-4 accent-accent"
            />
            <span className="flex flex-col">
              <span className="flex items-center gap-1.5 font-medium">
                {option.icon}
                {option.label}
              </span>
              <span className="text-xs text-ink-muted">{option.hint}</span>
            </span>
          </label>
        ))}
      </fieldset>
      <InspectorSelect
        id={materialId}
        label="Material"
        value={material}
        onChange={(value) => {
          setMaterial(value);
          setThickness(thicknessFor(kind, value));
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
        validate={(mm) => (captured ? capturedThicknessProblem(mm, slot, units) : null)}
        onCommit={(mm) => setThickness(mm)}
      />
      {kind === 'panel' ? (
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
      ) : null}
      {kind === 'hinged-door' ? (
        <InspectorSelect id={hingeId} label="Hinges on" value={hingeSide} onChange={(value) => setHingeSide(value as 'left' | 'right')}>
          <option value="left">Left upright</option>
          <option value="right">Right upright</option>
        </InspectorSelect>
      ) : null}
      {error || thicknessProblem ? (
        <p role="alert" className="text-xs text-severity-error">
          <span className="font-semibold">Cannot fill: </span>
          {error ?? thicknessProblem}
        </p>
      ) : null}
      <Button variant="primary" icon={choice.icon} onClick={fill}>
        {choice.action}
      </Button>
      {captured ? <p className="text-xs text-ink-muted">A captured panel goes in before the last profile of its frame closes the slot.</p> : null}
      {kind !== 'panel' ? (
        <p className="text-xs text-ink-muted">
          Doors stand on the outer face of the frame. Check the hardware supplier&apos;s data for the weight a track or hinge carries, and keep
          fingers clear of closing edges.
        </p>
      ) : null}
    </InspectorSection>
  );
}

/** The thickest listed thickness that fits the slot (the rule in design/slotLimits.ts), or the thinnest listed when none does. */
function fittingThickness(thicknesses: number[], slotOpening: number | undefined): number {
  const thinnest = thicknesses.length ? Math.min(...thicknesses) : 3;
  if (slotOpening === undefined) return thinnest;
  return thickestFittingThickness(thicknesses, slotOpening) ?? thinnest;
}

/** The thinnest listed sheet of at least the preferred door thickness, else the thickest listed. */
function doorThickness(thicknesses: number[]): number {
  const sorted = [...thicknesses].sort((a, b) => a - b);
  return sorted.find((t) => t >= PREFERRED_DOOR_THICKNESS_MM) ?? sorted[sorted.length - 1] ?? PREFERRED_DOOR_THICKNESS_MM;
}

/** A captured panel uses the clear opening; a face-mounted sheet covers to the profiles' centre lines and sits on their face. */
