import { defaultCatalogue, getSystem } from '@/domain/catalogue';
import { formatLength, formatMass } from '@/domain/units';
import { useEditorStore } from '../store/editorStore';
import { EndTreatmentActions } from './EndTreatmentActions';
import { FrameGroupInspector } from './FrameGroupInspector';
import { InspectorSection, ValueRow } from './InspectorSection';
import { JointProposals } from './JointProposals';

/** With nothing selected: the design at a glance, its unjoined meetings and its ends. */
export function DesignOverview() {
  const design = useEditorStore((state) => state.design);
  const units = useEditorStore((state) => state.units);
  const mass = useEditorStore((state) => state.analysis?.mass);
  const system = getSystem(defaultCatalogue, design.systemId);
  return (
    <>
      <InspectorSection title="Design">
        <dl className="flex flex-col gap-1.5">
          <ValueRow name="System" value={system?.name ?? design.systemId} />
          <ValueRow name="Profiles" value={design.profiles.length} />
          <ValueRow name="Joints" value={design.joints.length} />
          <ValueRow name="Panels" value={design.panels.length} />
          {mass && design.profiles.length > 0 ? (
            <>
              <ValueRow
                name="Overall"
                value={`${formatLength(mass.overallSize.x, units)} × ${formatLength(mass.overallSize.y, units)} × ${formatLength(mass.overallSize.z, units)}`}
              />
              <ValueRow name="Weight" value={formatMass(mass.total, units)} />
            </>
          ) : null}
        </dl>
        {design.profiles.length === 0 ? (
          <p className="text-sm text-ink-soft">Start with the Draw tool (D), or pick a frame starter from the tool strip.</p>
        ) : (
          <p className="text-xs text-ink-muted">Click a part to inspect it; Shift-click adds to the selection.</p>
        )}
      </InspectorSection>
      {(design.frameGroups ?? []).map((group) => (
        <FrameGroupInspector key={group.id} group={group} />
      ))}
      <JointProposals />
      {design.profiles.length > 0 ? <EndTreatmentActions /> : null}
    </>
  );
}
