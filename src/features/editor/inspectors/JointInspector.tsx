import { useId } from 'react';
import { defaultCatalogue } from '@/domain/catalogue';
import { jointHostSystemId } from '@/domain/design/jointHardware';
import type { Joint, JointKind } from '@/domain/design/schema';
import { formatLength } from '@/domain/units';
import { Button } from '@/components/ui';
import { Trash2 } from 'lucide-react';
import { operationCommand } from '../commands/operationCommand';
import { updateJointCommand } from '../commands/patchCommands';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { InspectorSection, InspectorSelect } from './InspectorSection';
import { JOINT_KIND_NAMES, JOINT_KIND_NOTES, MACHINING_NAMES, TWO_WAY_JOINT_KINDS } from './partNames';
import { jointHardware, jointMachining } from './jointHardware';

/** A joint: its connector kind (changing it redoes the machining), screw head, T-nut kind, and what it brings. */
export function JointInspector({ joint }: { joint: Joint }) {
  const store = useEditorStoreApi();
  const design = useEditorStore((state) => state.design);
  const units = useEditorStore((state) => state.units);
  const kindId = useId();
  const headId = useId();
  const nutId = useId();
  const kinds: JointKind[] = joint.members.length === 3 ? ['corner-cube'] : joint.kind === 'hinge' ? ['hinge'] : TWO_WAY_JOINT_KINDS;
  const { lines, hexKeys } = jointHardware(joint, jointHostSystemId(design, joint, defaultCatalogue), defaultCatalogue);
  const machining = jointMachining(design, joint.id);

  return (
    <>
      <InspectorSection title={`Joint: ${JOINT_KIND_NAMES[joint.kind].toLowerCase()}`}>
        <p className="text-sm text-ink-soft">
          Joins {joint.members.map((member) => `${member.profileId} (${member.at === 'span' ? 'along its length' : `${member.at} end`})`).join(' to ')}.
        </p>
        <InspectorSelect
          id={kindId}
          label="Connector"
          value={joint.kind}
          onChange={(value) =>
            store.getState().execute(
              operationCommand(`Use ${JOINT_KIND_NAMES[value as JointKind].toLowerCase()} at this joint`, {
                type: 'setJointConnector',
                payload: { jointId: joint.id, kind: value as JointKind },
              }),
            )
          }
        >
          {kinds.map((kind) => (
            <option key={kind} value={kind}>
              {JOINT_KIND_NAMES[kind]}
            </option>
          ))}
        </InspectorSelect>
        <p className="text-xs text-ink-muted">{JOINT_KIND_NOTES[joint.kind]}</p>
        <div className="grid grid-cols-2 gap-2">
          <InspectorSelect
            id={headId}
            label="Screw head"
            value={joint.fastenerHead}
            onChange={(value) => store.getState().execute(updateJointCommand(`Use ${value} head screws at this joint`, joint.id, { fastenerHead: value as Joint['fastenerHead'] }))}
          >
            <option value="button">Button head</option>
            <option value="socket">Socket head</option>
            <option value="flat">Flat head</option>
          </InspectorSelect>
          <InspectorSelect
            id={nutId}
            label="T-nut"
            value={joint.tNut}
            onChange={(value) => store.getState().execute(updateJointCommand(`Use ${value} T-nuts at this joint`, joint.id, { tNut: value as Joint['tNut'] }))}
          >
            <option value="drop-in">Drop-in</option>
            <option value="slide-in">Slide-in</option>
          </InspectorSelect>
        </div>
        {joint.tNut === 'slide-in' ? (
          <p className="text-xs text-severity-warning">Slide-in T-nuts enter from an open profile end: fit them before that end is joined or capped.</p>
        ) : null}
      </InspectorSection>
      <InspectorSection title="This joint brings">
        <HardwareList lines={lines} />
        {hexKeys.length > 0 ? <p className="text-xs text-ink-muted">Hex key: {hexKeys.join(', ')}</p> : null}
      </InspectorSection>
      <InspectorSection title="Machining">
        {machining.length === 0 ? (
          <p className="text-sm text-ink-muted">None: this connector needs no drilling or tapping.</p>
        ) : (
          <ul className="flex flex-col gap-1 text-sm">
            {machining.map(({ profileId, operation }) => (
              <li key={operation.id} className="flex justify-between gap-2">
                <span>
                  {MACHINING_NAMES[operation.kind]} on {profileId}
                </span>
                <span className="text-right tabular-nums text-ink-soft">
                  {operation.kind === 'end-tap' ? `${operation.fromEnd} end` : `${formatLength(operation.offset, units)} from ${operation.fromEnd}`}
                  {operation.diameter ? ` · ⌀${formatLength(operation.diameter, units)}` : ''}
                </span>
              </li>
            ))}
          </ul>
        )}
        <p className="text-xs text-ink-muted">Drilling and tapping: follow the supplier&apos;s data for hole sizes and wear eye protection.</p>
      </InspectorSection>
      <div className="px-4 py-4">
        <Button
          variant="secondary"
          icon={<Trash2 aria-hidden className="size-4" />}
          onClick={() => {
            if (store.getState().execute(operationCommand(`Remove the ${JOINT_KIND_NAMES[joint.kind].toLowerCase()}`, { type: 'removeJoint', payload: { jointId: joint.id } }))) {
              store.getState().clearSelection();
            }
          }}
        >
          Remove joint
        </Button>
      </div>
    </>
  );
}

export function HardwareList({ lines }: { lines: { name: string; quantity: number }[] }) {
  return (
    <ul className="flex flex-col gap-1 text-sm">
      {lines.map((line) => (
        <li key={line.name} className="flex justify-between gap-2">
          <span className="text-ink">{line.name}</span>
          <span className="tabular-nums text-ink-soft">× {line.quantity}</span>
        </li>
      ))}
    </ul>
  );
}
