import { useEditorStore } from '../store/editorStore';
import { AccessoryInspector } from './AccessoryInspector';
import { DesignOverview } from './DesignOverview';
import { DoorHardwareActions } from './DoorHardwareActions';
import { FrameGroupInspector } from './FrameGroupInspector';
import { FillOpeningInspector } from './FillOpeningInspector';
import { InspectorSection } from './InspectorSection';
import { JointInspector } from './JointInspector';
import { JointProposals } from './JointProposals';
import { PanelInspector } from './PanelInspector';
import { ProfileInspector } from './ProfileInspector';
import { SelectionActions } from './SelectionActions';

/** Picks the inspector for the current tool and selection. */
export function InspectorContent() {
  const tool = useEditorStore((state) => state.tool);
  const selection = useEditorStore((state) => state.selection);
  const design = useEditorStore((state) => state.design);

  if (tool === 'fill-opening') return <FillOpeningInspector />;
  if (selection.length === 0) return <DesignOverview />;

  if (selection.length === 1) {
    const id = selection[0];
    const group = (design.frameGroups ?? []).find((candidate) => candidate.partIds.includes(id));
    const profile = design.profiles.find((candidate) => candidate.id === id);
    if (profile)
      return (
        <div key={id}>
          <ProfileInspector profile={profile} />
          {group ? <FrameGroupInspector group={group} /> : null}
          <JointProposals profileId={id} />
          <SelectionActions ids={selection} />
        </div>
      );
    const joint = design.joints.find((candidate) => candidate.id === id);
    if (joint) return <JointInspector key={id} joint={joint} />;
    const panel = design.panels.find((candidate) => candidate.id === id);
    if (panel)
      return (
        <div key={id}>
          <PanelInspector panel={panel} />
          <DoorHardwareActions panel={panel} />
          <SelectionActions ids={selection} />
        </div>
      );
    const accessory = design.accessories.find((candidate) => candidate.id === id);
    if (accessory) return <AccessoryInspector key={id} accessory={accessory} />;
  }

  const profiles = selection.filter((id) => design.profiles.some((profile) => profile.id === id)).length;
  const panels = selection.filter((id) => design.panels.some((panel) => panel.id === id)).length;
  return (
    <>
      <InspectorSection title={`${selection.length} selected`}>
        <p className="text-sm text-ink-soft">
          <span className="tabular-nums">{profiles}</span> profiles, <span className="tabular-nums">{panels}</span> panels, <span className="tabular-nums">{selection.length - profiles - panels}</span> other parts.
        </p>
      </InspectorSection>
      <SelectionActions ids={selection} />
    </>
  );
}
