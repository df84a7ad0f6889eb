import { useId, useMemo, useState } from 'react';
import { Check, Link } from 'lucide-react';
import { defaultCatalogue, connectorFor, getVariant } from '@/domain/catalogue';
import { jointHostSystemId } from '@/domain/design/jointHardware';
import { detectJoints, type JointProposal } from '@/domain/design/jointDetection';
import type { DesignDocument, JointKind } from '@/domain/design/schema';
import { Button } from '@/components/ui';
import type { EditorCommand } from '../commands/EditorCommand';
import { groupCommand } from '../commands/groupCommand';
import { operationCommand } from '../commands/operationCommand';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import { HardwareList } from './JointInspector';
import { InspectorSection } from './InspectorSection';
import { jointHardware } from './jointHardware';
import { JOINT_KIND_NAMES, TWO_WAY_JOINT_KINDS } from './partNames';

const MEETING_NAMES: Record<JointProposal['kind'], string> = {
  corner: 'Corner',
  tee: 'Tee',
  splice: 'In-line splice',
  'corner-cube': 'Three-way corner',
};

/** What people call a profile here: its label, else its length; never the internal id. */
function profileLabel(design: DesignDocument, profileId: string): string {
  const profile = design.profiles.find((candidate) => candidate.id === profileId);
  if (!profile) return 'a missing profile';
  return profile.label ?? `${Math.round(profile.length)} mm profile`;
}

function acceptCommand(design: DesignDocument, proposal: JointProposal, kind: JointKind): EditorCommand {
  const names = proposal.members.map((member) => profileLabel(design, member.profileId)).join(' + ');
  return operationCommand(`Join ${names} with ${JOINT_KIND_NAMES[kind].toLowerCase()}`, {
    type: 'addJoint',
    payload: { joint: { kind, members: proposal.members } },
  });
}

/**
 * "Unjoined meetings": where profile ends meet other profiles without a joint. Each can be
 * accepted with a chosen connector kind (its machining is added with it), or all at once.
 * `profileId` narrows the list to meetings involving one profile.
 */
export function JointProposals({ profileId }: { profileId?: string }) {
  const design = useEditorStore((state) => state.design);
  const store = useEditorStoreApi();
  const all = useMemo(() => detectJoints(design), [design]);
  const proposals = profileId ? all.filter((proposal) => proposal.members.some((member) => member.profileId === profileId)) : all;

  return (
    <InspectorSection
      title={`Unjoined meetings (${proposals.length})`}
      actions={
        proposals.length > 1 ? (
          <Button
            variant="secondary"
            className="min-h-9 px-3 text-xs"
            icon={<Check aria-hidden className="size-4" />}
            onClick={() =>
              store.getState().execute(
                groupCommand(
                  `Join ${proposals.length} meetings`,
                  proposals.map((proposal) => acceptCommand(design, proposal, proposal.suggestedJointKind)),
                ),
              )
            }
          >
            Accept all
          </Button>
        ) : null
      }
    >
      {proposals.length === 0 ? (
        <p className="text-sm text-ink-muted">Every profile end that meets another profile has a joint.</p>
      ) : (
        <ul className="flex flex-col gap-2" aria-label="Unjoined meetings">
          {proposals.map((proposal) => (
            <ProposalRow key={proposal.id} proposal={proposal} onAccept={(kind) => store.getState().execute(acceptCommand(store.getState().design, proposal, kind))} />
          ))}
        </ul>
      )}
    </InspectorSection>
  );
}

function ProposalRow({ proposal, onAccept }: { proposal: JointProposal; onAccept: (kind: JointKind) => void }) {
  const [kind, setKind] = useState<JointKind>(proposal.suggestedJointKind);
  const [showParts, setShowParts] = useState(false);
  const selectId = useId();
  const setHovered = useEditorStore((state) => state.setHovered);
  const design = useEditorStore((state) => state.design);
  const kinds: JointKind[] = proposal.kind === 'corner-cube' ? ['corner-cube'] : TWO_WAY_JOINT_KINDS;
  const firstProfile = design.profiles.find((profile) => profile.id === proposal.members[0].profileId);
  const systemId = (firstProfile && getVariant(defaultCatalogue, firstProfile.variantId)?.systemId) ?? design.systemId;
  const connector = connectorFor(defaultCatalogue, systemId, kind);
  const hardware = connector ? jointHardware({ connectorId: connector.id, fastenerHead: 'button', tNut: 'drop-in', quantity: 1 }, jointHostSystemId(design, proposal, defaultCatalogue)) : null;
  const machiningCount = connector?.machining.length ?? 0;

  return (
    <li
      className="flex flex-col gap-2 rounded-lg border border-paper-line p-2.5"
      data-testid="joint-proposal"
      onPointerEnter={() => setHovered(proposal.members[0].profileId)}
      onPointerLeave={() => setHovered(null)}
    >
      <p className="text-sm text-ink">
        <span className="font-medium">{MEETING_NAMES[proposal.kind]}</span>{' '}
        <span className="text-ink-soft">{proposal.members.map((member) => profileLabel(design, member.profileId)).join(' · ')}</span>
      </p>
      <div className="flex items-end gap-2">
        <div className="flex min-w-0 flex-1 flex-col gap-1">
          <label htmlFor={selectId} className="sr-only">
            Connector for this meeting
          </label>
          <select
            id={selectId}
            value={kind}
            onChange={(event) => setKind(event.target.value as JointKind)}
            className="min-h-11 w-full rounded-lg border border-paper-line bg-paper-raised px-2 text-sm focus-ring"
          >
            {kinds.map((option) => (
              <option key={option} value={option}>
                {JOINT_KIND_NAMES[option]}
              </option>
            ))}
          </select>
        </div>
        <Button variant="primary" icon={<Link aria-hidden className="size-4" />} onClick={() => onAccept(kind)}>
          Accept
        </Button>
      </div>
      <button type="button" className="self-start text-xs text-accent-strong underline underline-offset-2 focus-ring" aria-expanded={showParts} onClick={() => setShowParts((value) => !value)}>
        {showParts ? 'Hide what it brings' : `What it brings${machiningCount > 0 ? ` (+${machiningCount} machining)` : ''}`}
      </button>
      {showParts && hardware ? (
        <div className="flex flex-col gap-1">
          <HardwareList lines={hardware.lines} />
          {machiningCount > 0 ? <p className="text-xs text-ink-muted">Adds {machiningCount} machining operation(s) to the profiles.</p> : null}
        </div>
      ) : null}
    </li>
  );
}
