import type { JointKind, MachiningKind } from '@/domain/design/schema';

/** Words Slotwise uses on screen for connector kinds. */
export const JOINT_KIND_NAMES: Record<JointKind, string> = {
  'corner-bracket': 'Corner bracket',
  'gusset-plate': 'Gusset plate',
  'concealed-connector': 'Concealed connector',
  'end-screw': 'End screw',
  'corner-cube': 'Corner cube',
  hinge: 'Hinge',
};

/** One line on what each connector kind asks of the shop. */
export const JOINT_KIND_NOTES: Record<JointKind, string> = {
  'corner-bracket': 'Sits in the slots; no drilling.',
  'gusset-plate': 'Flat plate across the face; no drilling.',
  'concealed-connector': 'Hidden in the profile end; needs an access counterbore.',
  'end-screw': 'Screw into the tapped end; needs an end tap and an access hole.',
  'corner-cube': 'Joins three ends at a box corner.',
  hinge: 'Pivot for doors and lids.',
};

/** Connector kinds offered for an ordinary two-profile meeting. */
export const TWO_WAY_JOINT_KINDS: JointKind[] = ['corner-bracket', 'gusset-plate', 'concealed-connector', 'end-screw'];

export const MACHINING_NAMES: Record<MachiningKind, string> = {
  'access-counterbore': 'Access counterbore',
  'access-hole': 'Access hole',
  'end-tap': 'End tap',
  drill: 'Drilled hole',
};
