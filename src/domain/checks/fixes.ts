/**
 * Fixes the editor can apply, as serialisable design operations (design/operations.ts).
 * Each builder returns undefined when no operation expresses the fix.
 */
import type { FindingFix } from '../analysis/types';
import type { Joint, ProfileEnd } from '../design/schema';
import type { AnalysisContext, PanelInfo, ProfileInfo } from '../analysis/context';

export function addEndCapFix(ctx: AnalysisContext, info: ProfileInfo, end: ProfileEnd): FindingFix | undefined {
  const systemId = info.variant?.systemId ?? ctx.design.systemId;
  const part = ctx.catalogue.accessoriesBySystemKind.get(`${systemId}|end-cap`);
  if (!part) return undefined;
  return {
    label: 'Add an end cap',
    operation: { type: 'addAccessory', payload: { accessory: { kind: 'end-cap', partId: part.id, profileId: info.profile.id, end } } },
  };
}

/** Re-applying the joint's connector puts back the machining it needs. */
export function addMachiningFix(joint: Joint, label: string): FindingFix | undefined {
  return {
    label,
    operation: { type: 'setJointConnector', payload: { jointId: joint.id, kind: joint.kind, connectorId: joint.connectorId } },
  };
}

export function setPanelThicknessFix(panelId: string, thickness: number): FindingFix | undefined {
  return {
    label: `Use ${thickness} mm sheet`,
    operation: { type: 'updatePanel', payload: { panelId, changes: { thickness } } },
  };
}

export function addGasketFix(ctx: AnalysisContext, panel: PanelInfo, lengthMm: number): FindingFix | undefined {
  const systemId = panel.bounding[0]?.variant?.systemId ?? ctx.design.systemId;
  const part = ctx.catalogue.accessoriesBySystemKind.get(`${systemId}|gasket`);
  if (!part) return undefined;
  return {
    label: 'Add a panel gasket',
    operation: { type: 'addAccessory', payload: { accessory: { kind: 'gasket', partId: part.id, panelId: panel.panel.id, length: lengthMm } } },
  };
}

/** No operation changes a joint's T-nut kind yet, so this fix is described in words only. */
export function useDropInTNutsFix(_jointId: string): FindingFix | undefined {
  return undefined;
}
