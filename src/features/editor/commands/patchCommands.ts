import type { JointChanges, PanelChanges, ProfileChanges } from '@/domain/design/operationTypes';
import type { LengthUnit } from '@/domain/units';
import type { EditorCommand } from './EditorCommand';
import { operationCommand } from './operationCommand';

/** Field edits on one part: thin recorders of the domain's update operations. */
export function updateProfileCommand(label: string, profileId: string, changes: ProfileChanges): EditorCommand {
  return operationCommand(label, { type: 'updateProfile', payload: { profileId, changes } });
}

export function updatePanelCommand(label: string, panelId: string, changes: PanelChanges): EditorCommand {
  return operationCommand(label, { type: 'updatePanel', payload: { panelId, changes } });
}

/** Fastener head, T-nut kind and count: joint fields with no machining consequence. */
export function updateJointCommand(label: string, jointId: string, changes: JointChanges): EditorCommand {
  return operationCommand(label, { type: 'updateJoint', payload: { jointId, changes } });
}

/** The units the design is shown in: saved with the design, so it opens the way it was made. */
export function setDesignUnitsCommand(units: LengthUnit): EditorCommand {
  return operationCommand(units === 'in' ? 'Show inches' : 'Show millimetres', { type: 'setUnits', payload: { units } });
}
