import { Trash2 } from 'lucide-react';
import { defaultCatalogue, getAccessoryPart } from '@/domain/catalogue';
import type { Accessory } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import { Button } from '@/components/ui';
import { operationCommand } from '../commands/operationCommand';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { InspectorSection, ValueRow } from './InspectorSection';

/** An accessory: what it is, where it sits, and removing it. */
export function AccessoryInspector({ accessory }: { accessory: Accessory }) {
  const store = useEditorStoreApi();
  const units = useEditorStore((state) => state.units);
  const part = getAccessoryPart(defaultCatalogue, accessory.partId);
  return (
    <InspectorSection title={`Accessory: ${accessory.kind.replace(/-/g, ' ')}`}>
      <dl className="flex flex-col gap-1.5">
        <ValueRow name="Part" value={part?.name ?? accessory.partId} />
        {accessory.profileId ? <ValueRow name="On profile" value={`${accessory.profileId}${accessory.end ? `, ${accessory.end} end` : ''}`} /> : null}
        {accessory.panelId ? <ValueRow name="On panel" value={accessory.panelId} /> : null}
        {accessory.along !== undefined ? <ValueRow name="Along" value={formatLength(accessory.along, units)} /> : null}
        {accessory.length !== undefined ? <ValueRow name="Length" value={formatLength(accessory.length, units)} /> : null}
        <ValueRow name="Quantity" value={accessory.quantity} />
      </dl>
      <Button
        icon={<Trash2 aria-hidden className="size-4" />}
        onClick={() => {
          if (store.getState().execute(operationCommand(`Remove ${part?.name ?? accessory.kind}`, { type: 'removeParts', payload: { ids: [accessory.id] } }))) {
            store.getState().clearSelection();
          }
        }}
      >
        Remove
      </Button>
    </InspectorSection>
  );
}
