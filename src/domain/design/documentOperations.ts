/**
 * Operations on the document beyond its parts: settings, load cases, joint fields, inserting and
 * replacing a design. Like every `DesignOperation`, each is pure and serialisable, so an editor
 * history can be saved as JSON and replayed. Lengths mm.
 */
import { besideOffset, mergeDesign } from './mergeDesign';
import { OperationError, type JointChanges, type SettingsChanges } from './operationTypes';
import type { DesignDocument, LoadCase, Vec3 } from './schema';
import { LENGTH_UNITS, type LengthUnit } from '../units';

/**
 * Sets the units the design is shown in ('mm' or 'in'). Only a display preference, saved with the
 * design so it opens the way it was made: every length inside stays in mm.
 */
export function setUnits(design: DesignDocument, units: LengthUnit): DesignDocument {
  if (!(LENGTH_UNITS as readonly string[]).includes(units)) throw new OperationError(`Units must be ${LENGTH_UNITS.join(' or ')}, not "${String(units)}"`);
  return design.units === units ? design : { ...design, units };
}

/** Changes design.settings fields (stock length, kerf, end trim, reusable offcut, …), mm. */
export function updateSettings(design: DesignDocument, changes: SettingsChanges): DesignDocument {
  for (const [key, value] of Object.entries(changes)) {
    if (typeof value === 'number' && !(Number.isFinite(value) && value >= 0)) throw new OperationError(`${key} must be a number of at least 0`);
  }
  return { ...design, settings: { ...design.settings, ...changes } };
}

/** Appends a load case; refuses a duplicate id so a design never holds two cases with one id. */
export function addLoadCase(design: DesignDocument, loadCase: LoadCase): DesignDocument {
  if (design.loadCases.some((existing) => existing.id === loadCase.id)) {
    throw new OperationError(`A load case with id "${loadCase.id}" already exists.`);
  }
  return { ...design, loadCases: [...design.loadCases, loadCase] };
}

/** Removes a load case by id. */
export function removeLoadCase(design: DesignDocument, loadCaseId: string): DesignDocument {
  if (!design.loadCases.some((existing) => existing.id === loadCaseId)) throw new OperationError(`There is no load case "${loadCaseId}".`);
  return { ...design, loadCases: design.loadCases.filter((existing) => existing.id !== loadCaseId) };
}

/** Fastener head, T-nut kind and count of a joint: fields with no machining consequence. */
export function updateJoint(design: DesignDocument, jointId: string, changes: JointChanges): DesignDocument {
  if (!design.joints.some((joint) => joint.id === jointId)) throw new OperationError(`There is no part "${jointId}" in this design.`);
  if (changes.quantity !== undefined && !(Number.isInteger(changes.quantity) && changes.quantity >= 1)) {
    throw new OperationError('A joint quantity is a whole number from 1');
  }
  return { ...design, joints: design.joints.map((joint) => (joint.id === jointId ? { ...joint, ...changes } : joint)) };
}

/** Adds `inserted`'s parts, renamed, moved by `offset` mm (default: beside the current frame along +X). */
export function insertDesign(design: DesignDocument, inserted: DesignDocument, offset?: Vec3): DesignDocument {
  return mergeDesign(design, inserted, offset ?? besideOffset(design, inserted));
}

/** The whole document replaced (a generator's "replace current design"). */
export function replaceDesign(_design: DesignDocument, next: DesignDocument): DesignDocument {
  return next;
}
