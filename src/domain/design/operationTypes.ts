/**
 * The inputs of the design operations and their serialisable form, `DesignOperation`
 * (type + payload), which findings carry as fixes and the editor replays. Lengths mm.
 */
import type { LengthUnit } from '../units';
import type { Accessory, AccessoryKind, AssemblyStep, Axis, Cutout, DesignDocument, DesignSettings, Joint, JointKind, JointMember, LoadCase, Panel, Vec3 } from './schema';

export class OperationError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'OperationError';
  }
}

export interface ProfileInput {
  id?: string;
  variantId?: string;
  start: Vec3;
  direction: Vec3;
  length: number;
  rollDeg?: number;
  label?: string;
}
export interface ProfileChanges {
  length?: number;
  start?: Vec3;
  direction?: Vec3;
  rollDeg?: number;
  variantId?: string;
  label?: string;
}
export interface JointInput {
  id?: string;
  kind: JointKind;
  /** Omitted: the system's connector of that kind. */
  connectorId?: string;
  members: JointMember[];
  fastenerHead?: Joint['fastenerHead'];
  tNut?: Joint['tNut'];
  quantity?: number;
}
export interface PanelInput {
  id?: string;
  materialId: string;
  thickness: number;
  mounting: Panel['mounting'];
  role?: Panel['role'];
  boundedBy?: string[];
  rect: Panel['rect'];
  cutouts?: Omit<Cutout, 'id'>[];
  label?: string;
}
export type PanelChanges = Partial<Pick<Panel, 'materialId' | 'thickness' | 'mounting' | 'role' | 'rect' | 'label' | 'boundedBy'>>;
export interface AccessoryInput {
  id?: string;
  kind: AccessoryKind;
  partId: string;
  profileId?: string;
  panelId?: string;
  end?: Accessory['end'];
  along?: number;
  length?: number;
  quantity?: number;
}

/** A frame opening as `findOpenings` reports it: its four profiles and clear rectangle. */
/** Changes to a step's words (assembly/sequenceOperations.ts). */
export interface StepChanges {
  title?: string;
  notes?: string;
  caution?: string;
  kind?: AssemblyStep['kind'];
}

export interface DoorOpeningInput {
  opening: { boundedBy: string[]; rect: Panel['rect'] };
  /** Which side of the opening along its normal the doors stand on; omitted: away from the frame's middle. */
  side?: 1 | -1;
}
export interface SlidingDoorsInput extends DoorOpeningInput {
  materialId: string;
  /** Sheet thickness, mm. */
  thickness: number;
  /** How far each leaf reaches past the middle, mm; omitted: SLIDING_LEAF_OVERLAP_MM. */
  overlap?: number;
}
export interface HingedDoorInput extends DoorOpeningInput {
  materialId: string;
  thickness: number;
  /** The upright the hinges go on, seen from the door side's axis order; omitted: 'left'. */
  hingeSide?: 'left' | 'right';
}

export type SettingsChanges = Partial<Pick<DesignSettings, 'stockLength' | 'kerf' | 'endTrim' | 'minReusableOffcut'>>;
export type JointChanges = Partial<Pick<Joint, 'fastenerHead' | 'tNut' | 'quantity'>>;
/** A frame starter run as a frame group (see frameGroups.ts); params in mm. */
export interface FrameGroupInput {
  generatorId: string;
  params: Record<string, number | string | boolean | null>;
  placement: 'replace' | 'beside';
  /** Where the starter's origin goes, mm. */
  origin?: Vec3;
  id?: string;
  name?: string;
}

export type DesignOperation =
  | { type: 'addProfile'; payload: { profile: ProfileInput } }
  | { type: 'updateProfile'; payload: { profileId: string; changes: ProfileChanges } }
  | { type: 'removeParts'; payload: { ids: string[] } }
  | { type: 'translateParts'; payload: { ids: string[]; offset: Vec3 } }
  | { type: 'duplicateParts'; payload: { ids: string[]; offset?: Vec3 } }
  | { type: 'mirrorParts'; payload: { ids: string[]; axis: Axis; point: Vec3; keepOriginal?: boolean } }
  | { type: 'arrayParts'; payload: { ids: string[]; count: number; spacing: Vec3 } }
  | { type: 'rotateParts90'; payload: { ids: string[]; axis: Axis; point: Vec3; quarterTurns?: number } }
  | { type: 'setJointConnector'; payload: { jointId: string; kind: JointKind; connectorId?: string } }
  | { type: 'addJoint'; payload: { joint: JointInput } }
  | { type: 'removeJoint'; payload: { jointId: string } }
  | { type: 'addPanel'; payload: { panel: PanelInput } }
  | { type: 'updatePanel'; payload: { panelId: string; changes: PanelChanges } }
  | { type: 'addCutout'; payload: { panelId: string; cutout: Omit<Cutout, 'id' | 'kind'> & { id?: string } } }
  | { type: 'addAccessory'; payload: { accessory: AccessoryInput } }
  | { type: 'addSlidingDoors'; payload: { doors: SlidingDoorsInput } }
  | { type: 'addHingedDoor'; payload: { door: HingedDoorInput } }
  | { type: 'autoEndCaps'; payload?: Record<string, never> }
  | { type: 'addFeetToFreeBottomEnds'; payload?: { kind?: 'leveling-foot' | 'caster' } }
  | { type: 'updateSettings'; payload: { changes: SettingsChanges } }
  | { type: 'setUnits'; payload: { units: LengthUnit } }
  | { type: 'addLoadCase'; payload: { loadCase: LoadCase } }
  | { type: 'removeLoadCase'; payload: { loadCaseId: string } }
  | { type: 'updateJoint'; payload: { jointId: string; changes: JointChanges } }
  | { type: 'insertDesign'; payload: { design: DesignDocument; offset?: Vec3 } }
  | { type: 'replaceDesign'; payload: { design: DesignDocument } }
  // Assembly sequence edits (src/domain/assembly/sequenceOperations.ts).
  | { type: 'moveStep'; payload: { stepId: string; toIndex: number } }
  | { type: 'moveStepBefore'; payload: { stepId: string; beforeStepId: string } }
  | { type: 'moveStepAfter'; payload: { stepId: string; afterStepId: string } }
  | { type: 'mergeSteps'; payload: { stepIds: string[] } }
  | { type: 'splitStep'; payload: { stepId: string; partIds: string[]; newStepId?: string } }
  | { type: 'movePartsToStep'; payload: { partIds: string[]; stepId: string } }
  | { type: 'updateStep'; payload: { stepId: string; changes: StepChanges } }
  | { type: 'regenerateSequence'; payload?: Record<string, never> }
  | { type: 'addFrameGroup'; payload: { group: FrameGroupInput } }
  | { type: 'regenerateFrameGroup'; payload: { groupId: string; params: Record<string, number | string | boolean | null> } }
  | { type: 'renameFrameGroup'; payload: { groupId: string; name: string } };
  ;


/** Operations that edit the assembly sequence rather than the parts. */
export const SEQUENCE_OPERATION_TYPES: ReadonlySet<string> = new Set(['moveStep', 'moveStepBefore', 'moveStepAfter', 'mergeSteps', 'splitStep', 'movePartsToStep', 'updateStep', 'regenerateSequence']);

/** Operations that change only how the design is shown: its parts and assembly steps stay as they are. */
export const DISPLAY_OPERATION_TYPES: ReadonlySet<string> = new Set(['setUnits']);

export type DesignOperationType = DesignOperation['type'];
