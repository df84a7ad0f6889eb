import { DoorOpen } from 'lucide-react';
import { accessoryFor, defaultCatalogue } from '@/domain/catalogue';
import type { AccessoryKind, Panel } from '@/domain/design/schema';
import { Button } from '@/components/ui';
import { operationCommand } from '../commands/operationCommand';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { InspectorSection } from './InspectorSection';
import { panelSystem } from './panelRules';

const DOOR_PARTS: { kind: AccessoryKind; label: string; quantity: number }[] = [
  { kind: 'hinge', label: 'Add two hinges', quantity: 2 },
  { kind: 'handle', label: 'Add a handle', quantity: 1 },
  { kind: 'latch', label: 'Add a latch', quantity: 1 },
];

/** For a door panel: hinges, handle and latch from the frame's system, each one undoable command. */
export function DoorHardwareActions({ panel }: { panel: Panel }) {
  const store = useEditorStoreApi();
  const design = useEditorStore((state) => state.design);
  const system = panelSystem(design, panel);
  const onDoor = design.accessories.filter((accessory) => accessory.panelId === panel.id);
  if (panel.role !== 'door' || !system) return null;

  return (
    <InspectorSection title="Door hardware">
      {onDoor.length > 0 ? (
        <ul className="flex flex-col gap-1 text-sm">
          {onDoor.map((accessory) => (
            <li key={accessory.id} className="flex justify-between">
              <span>{accessory.kind}</span>
              <span className="tabular-nums text-ink-soft">× {accessory.quantity}</span>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-ink-muted">No hinges, handle or latch yet.</p>
      )}
      <div className="flex flex-col gap-2">
        {DOOR_PARTS.map(({ kind, label, quantity }) => {
          const part = accessoryFor(defaultCatalogue, system.id, kind);
          if (!part) return null;
          return (
            <Button
              key={kind}
              icon={<DoorOpen aria-hidden className="size-4" />}
              onClick={() =>
                store.getState().execute(
                  operationCommand(`${label} to ${panel.label ?? 'the door'}`, { type: 'addAccessory', payload: { accessory: { kind, partId: part.id, panelId: panel.id, quantity } } }),
                )
              }
            >
              {label}
            </Button>
          );
        })}
      </div>
    </InspectorSection>
  );
}
