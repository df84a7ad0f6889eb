import { useId, useMemo, useState } from 'react';
import { Footprints, ShieldCheck } from 'lucide-react';
import { bottomEnds, endAccessories, freeEnds } from '@/domain/design/endTreatments';
import { Button } from '@/components/ui';
import { operationCommand } from '../commands/operationCommand';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { InspectorSection, InspectorSelect } from './InspectorSection';

/** Finishing the frame's ends: feet or casters under free bottom ends, end caps on every other free end. */
export function EndTreatmentActions() {
  const store = useEditorStoreApi();
  const design = useEditorStore((state) => state.design);
  const [footKind, setFootKind] = useState<'leveling-foot' | 'caster'>('leveling-foot');
  const kindId = useId();
  const free = useMemo(() => freeEnds(design).length, [design]);
  // Bottom ends still without a foot or caster (an end cap there is replaced by the foot).
  const bottom = useMemo(() => {
    const treated = endAccessories(design);
    return bottomEnds(design).filter((ref) => {
      const accessory = treated.get(`${ref.profileId}@${ref.end}`);
      return !accessory || accessory.kind === 'end-cap';
    }).length;
  }, [design]);

  return (
    <InspectorSection title="Ends">
      <p className="text-sm text-ink-soft">
        <span className="tabular-nums">{free}</span> free ends, <span className="tabular-nums">{bottom}</span> at the bottom without feet.
      </p>
      <InspectorSelect id={kindId} label="Under the bottom ends" value={footKind} onChange={(value) => setFootKind(value as 'leveling-foot' | 'caster')}>
        <option value="leveling-foot">Leveling feet</option>
        <option value="caster">Casters</option>
      </InspectorSelect>
      <Button
        disabled={bottom === 0}
        icon={<Footprints aria-hidden className="size-4" />}
        onClick={() =>
          store.getState().execute(
            operationCommand(footKind === 'caster' ? 'Put casters under free bottom ends' : 'Put feet under free bottom ends', {
              type: 'addFeetToFreeBottomEnds',
              payload: { kind: footKind },
            }),
          )
        }
      >
        Add {footKind === 'caster' ? 'casters' : 'feet'} to free bottom ends
      </Button>
      {footKind === 'caster' ? <p className="text-xs text-ink-muted">Check the caster&apos;s load rating in the supplier&apos;s data, and lock the brakes before working on the frame.</p> : null}
      <Button
        disabled={free === 0}
        icon={<ShieldCheck aria-hidden className="size-4" />}
        onClick={() => store.getState().execute(operationCommand('Cap all free ends', { type: 'autoEndCaps' }))}
      >
        Cap all free ends
      </Button>
    </InspectorSection>
  );
}
