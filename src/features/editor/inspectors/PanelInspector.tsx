import { useId, useState } from 'react';
import { Plus, Trash2 } from 'lucide-react';
import { defaultCatalogue, getPanelMaterial } from '@/domain/catalogue';
import type { PanelChanges } from '@/domain/design/operations';
import type { Panel } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import { Button } from '@/components/ui';
import { operationCommand } from '../commands/operationCommand';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { InspectorSection, InspectorSelect, ValueRow } from './InspectorSection';
import { LengthInput } from './LengthInput';
import { panelSlotLimits } from '@/domain/design/slotLimits';
import { capturedThicknessProblem } from './panelRules';

/** A panel: material, thickness (refused when it cannot fit the slot), mounting, role and round cut-outs. */
export function PanelInspector({ panel }: { panel: Panel }) {
  const store = useEditorStoreApi();
  const units = useEditorStore((state) => state.units);
  const design = useEditorStore((state) => state.design);
  const panelCut = useEditorStore((state) => state.analysis?.panelCuts.find((cut) => cut.panelId === panel.id));
  const materialId = useId();
  const mountingId = useId();
  const roleId = useId();
  const catalogue = defaultCatalogue;
  const slot = panelSlotLimits(design, panel.boundedBy);
  const material = getPanelMaterial(catalogue, panel.materialId);

  const update = (label: string, changes: PanelChanges): string | null => {
    const applied = store.getState().execute(operationCommand(label, { type: 'updatePanel', payload: { panelId: panel.id, changes } }));
    return applied ? null : (store.getState().lastRefusal?.message ?? 'The change was refused.');
  };

  return (
    <>
      <InspectorSection title={`Panel ${panel.label ?? `${panel.rect.width.toFixed(0)} × ${panel.rect.height.toFixed(0)} mm`}`}>
        <dl className="flex flex-col gap-1.5">
          <ValueRow name="Opening" value={`${formatLength(panel.rect.width, units)} × ${formatLength(panel.rect.height, units)}`} />
          {panelCut ? <ValueRow name="Cut sheet to" value={`${formatLength(panelCut.width, units)} × ${formatLength(panelCut.height, units)}`} /> : null}
          {panelCut && panelCut.notchedCorners > 0 ? (
            <ValueRow name="Corner notches" value={`${panelCut.notchedCorners} × ${formatLength(panelCut.cornerNotch, units)}`} />
          ) : null}
          {slot ? <ValueRow name="Slot opening" value={formatLength(slot.slotOpening, units)} /> : null}
        </dl>
        <InspectorSelect
          id={materialId}
          label="Material"
          value={panel.materialId}
          onChange={(value) => update(`Make ${panel.label ?? 'the panel'} ${getPanelMaterial(catalogue, value)?.name ?? value}`, { materialId: value })}
        >
          {catalogue.panelMaterials.map((option) => (
            <option key={option.id} value={option.id}>
              {option.name}
            </option>
          ))}
        </InspectorSelect>
        <LengthInput
          label="Thickness"
          valueMm={panel.thickness}
          units={units}
          validate={(mm) => (panel.mounting === 'captured' ? capturedThicknessProblem(mm, slot, units) : null)}
          onCommit={(mm) => update(`Set ${panel.label ?? 'the panel'} thickness to ${formatLength(mm, units)}`, { thickness: mm })}
          hint={material ? `Common: ${material.thicknesses.map((t) => formatLength(t, units)).join(', ')}` : undefined}
        />
        <div className="grid grid-cols-2 gap-2">
          <InspectorSelect
            id={mountingId}
            label="Mounting"
            value={panel.mounting}
            onChange={(value) => update(`Mount ${panel.label ?? 'the panel'} ${value === 'captured' ? 'in the slots' : 'on the face'}`, { mounting: value as Panel['mounting'] })}
          >
            <option value="captured">In the slots</option>
            <option value="face">On the face</option>
          </InspectorSelect>
          <InspectorSelect id={roleId} label="Role" value={panel.role} onChange={(value) => update(`Make ${panel.label ?? 'the panel'} a ${value}`, { role: value as Panel['role'] })}>
            <option value="panel">Panel</option>
            <option value="door">Door</option>
            <option value="shelf">Shelf</option>
          </InspectorSelect>
        </div>
      </InspectorSection>
      <CutoutSection panel={panel} />
    </>
  );
}

function CutoutSection({ panel }: { panel: Panel }) {
  const store = useEditorStoreApi();
  const units = useEditorStore((state) => state.units);
  const [u, setU] = useState(0);
  const [v, setV] = useState(0);
  const [diameter, setDiameter] = useState(50);
  const [error, setError] = useState<string | null>(null);

  const add = () => {
    const applied = store.getState().execute(
      operationCommand(`Add a ⌀${formatLength(diameter, units)} cut-out to ${panel.id}`, {
        type: 'addCutout',
        payload: { panelId: panel.id, cutout: { u, v, diameter } },
      }),
    );
    setError(applied ? null : (store.getState().lastRefusal?.message ?? 'The cut-out was refused.'));
  };

  return (
    <InspectorSection title="Round cut-outs">
      {panel.cutouts.length === 0 ? <p className="text-sm text-ink-muted">No cut-outs.</p> : null}
      <ul className="flex flex-col gap-1 text-sm">
        {panel.cutouts.map((cutout) => (
          <li key={cutout.id} className="flex items-center justify-between gap-2">
            <span className="tabular-nums">
              ⌀{formatLength(cutout.diameter, units)} at {formatLength(cutout.u, units)}, {formatLength(cutout.v, units)}
            </span>
            <button
              type="button"
              aria-label={`Remove cut-out ${cutout.id}`}
              className="grid size-11 place-items-center rounded-lg text-ink-soft hover:bg-paper-sunk focus-ring"
              onClick={() => store.getState().execute(operationCommand(`Remove cut-out ${cutout.id}`, { type: 'removeParts', payload: { ids: [cutout.id] } }))}
            >
              <Trash2 aria-hidden className="size-4" />
            </button>
          </li>
        ))}
      </ul>
      <p className="text-xs text-ink-muted">Position from the panel centre: across (width) and up (height).</p>
      <div className="grid grid-cols-3 gap-2">
        <LengthInput compact label="Across" accept="any" valueMm={u} units={units} onCommit={(mm) => setU(mm)} />
        <LengthInput compact label="Up" accept="any" valueMm={v} units={units} onCommit={(mm) => setV(mm)} />
        <LengthInput compact label="Diameter" valueMm={diameter} units={units} onCommit={(mm) => setDiameter(mm)} />
      </div>
      {error ? (
        <p role="alert" className="text-xs text-severity-error">
          <span className="font-semibold">Not added: </span>
          {error}
        </p>
      ) : null}
      <Button variant="secondary" icon={<Plus aria-hidden className="size-4" />} onClick={add}>
        Add cut-out
      </Button>
    </InspectorSection>
  );
}
