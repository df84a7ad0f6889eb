import { z } from 'zod';
import { LENGTH_UNITS } from '../units';
import {
  accessoryKindSchema,
  jointKindSchema,
  machiningKindSchema,
  type AccessoryKind,
  type JointKind,
  type MachiningKind,
} from '../catalogue/partKinds';

// The kinds of parts are the catalogue's words; the design document refers to them.
export { accessoryKindSchema, jointKindSchema, machiningKindSchema, type AccessoryKind, type JointKind, type MachiningKind };

/**
 * The Slotwise design document, version 1.
 *
 * Space: millimetres, right-handed, Y up (three.js convention). Every length in the document is
 * in millimetres; `units` is only the designer's display preference.
 *
 * A profile runs from `start` along the unit vector `direction` for `length` mm. Its cross-section
 * is centred on that line. `rollDeg` turns the cross-section about the profile's own axis; it matters
 * for rectangular variants (40 x 80): at roll 0 the section's local x (width) axis is world X,
 * unless the profile runs along X, in which case it is world Z. Orientation is stored as a vector so
 * angled braces can come later without a format change; the editor keeps it axis-aligned for now.
 */

export const CURRENT_SCHEMA_VERSION = 1 as const;

const id = z
  .string()
  .min(1, 'An id cannot be empty')
  .max(64, 'An id is at most 64 characters')
  .regex(/^[A-Za-z0-9_.:-]+$/, 'An id may use letters, digits and _ . : - only');

// z.number() itself refuses NaN and ±Infinity (zod 4), so no finiteness refine is needed per number.
const finite = z.number();
const positiveMm = finite.refine((v) => v > 0, 'Must be greater than 0 mm');
const nonNegativeMm = finite.refine((v) => v >= 0, 'Cannot be negative');

export const vec3Schema = z.tuple([finite, finite, finite]);
export type Vec3 = z.infer<typeof vec3Schema>;

export const unitVectorSchema = vec3Schema.refine(
  ([x, y, z]) => Math.abs(Math.hypot(x, y, z) - 1) < 1e-6,
  'A direction must be a unit vector',
);

export const profileEndSchema = z.enum(['start', 'end']);
export type ProfileEnd = z.infer<typeof profileEndSchema>;


export const machiningSchema = z.object({
  id,
  kind: machiningKindSchema,
  /** The end the position is measured from. */
  fromEnd: profileEndSchema,
  /** Distance from that end to the centre of the hole, mm (0 for an end tap). */
  offset: nonNegativeMm,
  /** Which of the four slot faces (0..3, counter-clockwise from the section's local +x) the hole is on. */
  face: z.number().int().min(0).max(3).default(0),
  /** Hole or tap diameter, mm; omitted means the catalogue default for the joint. */
  diameter: positiveMm.optional(),
  /** The joint this machining serves, if any. */
  jointId: id.optional(),
});
export type Machining = z.infer<typeof machiningSchema>;

export const profileSchema = z.object({
  id,
  /** Catalogue profile variant, e.g. "m40-40x40" (see catalogue). */
  variantId: id,
  length: positiveMm,
  start: vec3Schema,
  direction: unitVectorSchema,
  rollDeg: finite.default(0),
  label: z.string().max(80).optional(),
  machining: z.array(machiningSchema).default([]),
});
export type Profile = z.infer<typeof profileSchema>;


export const jointMemberSchema = z.object({
  profileId: id,
  /** The profile end at the joint, or "span" when the joint sits along the profile. */
  at: z.enum(['start', 'end', 'span']),
  /** For "span": distance from the profile's start to the joint, mm. */
  along: nonNegativeMm.optional(),
});
export type JointMember = z.infer<typeof jointMemberSchema>;

export const jointSchema = z.object({
  id,
  kind: jointKindSchema,
  /** Catalogue connector part id. */
  connectorId: id,
  /**
   * members[0] is the profile whose end is joined (it carries counterbores or end taps);
   * members[1] (and members[2] for a corner cube) are the profiles it meets.
   */
  members: z.array(jointMemberSchema).min(2).max(3),
  fastenerHead: z.enum(['socket', 'button', 'flat']).default('button'),
  tNut: z.enum(['drop-in', 'slide-in']).default('drop-in'),
  /** How many connectors of this kind the joint uses (e.g. two brackets on opposite faces). */
  quantity: z.number().int().min(1).max(8).default(1),
});
export type Joint = z.infer<typeof jointSchema>;

export const axisSchema = z.enum(['x', 'y', 'z']);
export type Axis = z.infer<typeof axisSchema>;

export const cutoutSchema = z.object({
  id,
  kind: z.enum(['round']),
  /** Centre offset from the panel centre along the panel's width (u) and height (v), mm. */
  u: finite,
  v: finite,
  diameter: positiveMm,
});
export type Cutout = z.infer<typeof cutoutSchema>;

export const panelSchema = z.object({
  id,
  materialId: id,
  thickness: positiveMm,
  mounting: z.enum(['captured', 'face']),
  role: z.enum(['panel', 'door', 'shelf']).default('panel'),
  /** The four profiles that bound the opening (captured panels). */
  boundedBy: z.array(id).length(4).optional(),
  /**
   * The visible rectangle: for a captured panel the clear opening between inner profile faces
   * (the core adds slot engagement to size the sheet); for a face-mounted panel the sheet itself.
   * `normal` is the axis the sheet faces; width runs along the first of the other two axes in
   * x, y, z order, height along the second.
   */
  rect: z.object({
    center: vec3Schema,
    normal: axisSchema,
    width: positiveMm,
    height: positiveMm,
  }),
  cutouts: z.array(cutoutSchema).default([]),
  label: z.string().max(80).optional(),
});
export type Panel = z.infer<typeof panelSchema>;


export const accessorySchema = z.object({
  id,
  kind: accessoryKindSchema,
  /** Catalogue part id. */
  partId: id,
  profileId: id.optional(),
  panelId: id.optional(),
  end: profileEndSchema.optional(),
  /** Distance from the profile start, mm, for parts along a profile. */
  along: nonNegativeMm.optional(),
  /** Length in mm for parts sold by length (gasket, slot cover, door track). */
  length: positiveMm.optional(),
  quantity: z.number().int().min(1).max(1000).default(1),
});
export type Accessory = z.infer<typeof accessorySchema>;

export const buildOrientationSchema = z.enum(['as-placed', 'lying-on-back', 'upside-down', 'on-side']);

export const subAssemblySchema = z.object({
  id,
  name: z.string().min(1).max(80),
  profileIds: z.array(id).default([]),
  panelIds: z.array(id).default([]),
  buildOrientation: buildOrientationSchema.default('as-placed'),
  /** Direction the finished sub-assembly moves to be joined to the rest. */
  joinDirection: unitVectorSchema.optional(),
});
export type SubAssembly = z.infer<typeof subAssemblySchema>;

export const assemblyStepSchema = z.object({
  id,
  title: z.string().min(1).max(120),
  /** Ids of profiles, joints, panels or accessories placed in this step. */
  partIds: z.array(id).default([]),
  subAssemblyId: id.optional(),
  insertionDirection: unitVectorSchema.optional(),
  notes: z.string().max(2000).optional(),
});
export type AssemblyStep = z.infer<typeof assemblyStepSchema>;

export const loadSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('point'),
    profileId: id,
    /** Distance from the profile start, mm. */
    along: nonNegativeMm,
    /** Force, newtons (positive, acting along `direction`). */
    force: positiveMm,
    direction: unitVectorSchema.default([0, -1, 0]),
  }),
  z.object({
    kind: z.literal('uniform'),
    /** A panel (load shared by its supporting profiles) or one profile. */
    panelId: id.optional(),
    profileId: id.optional(),
    /** Total force, newtons, spread evenly. */
    totalForce: positiveMm,
  }),
]);
export type Load = z.infer<typeof loadSchema>;

export const loadCaseSchema = z.object({
  id,
  name: z.string().min(1).max(80),
  loads: z.array(loadSchema).default([]),
  /** Beam end condition: simply supported is the conservative default. */
  support: z.enum(['simple', 'fixed']).default('simple'),
  /** Tip-over: horizontal push at this height above the floor, mm. */
  tipOverHeight: positiveMm.optional(),
});
export type LoadCase = z.infer<typeof loadCaseSchema>;

export const designSettingsSchema = z.object({
  alloyId: id.default('6063-T5'),
  stockLength: positiveMm.default(3000),
  kerf: nonNegativeMm.default(3),
  endTrim: nonNegativeMm.default(5),
  minReusableOffcut: nonNegativeMm.default(150),
  /** Clearance subtracted from a captured panel's size, total per direction, mm. */
  panelClearance: nonNegativeMm.default(1),
  cutTolerance: nonNegativeMm.default(0.5),
  safetyFactor: finite.refine((v) => v >= 1, 'A safety factor is at least 1').default(2),
  deflectionLimitRatio: finite.refine((v) => v > 0, 'Must be positive').default(360),
});
export type DesignSettings = z.infer<typeof designSettingsSchema>;

export const designDocumentSchema = z.object({
  schemaVersion: z.literal(CURRENT_SCHEMA_VERSION),
  name: z.string().trim().min(1, 'A design needs a name').max(120),
  units: z.enum(LENGTH_UNITS).default('mm'),
  /** The profile system new profiles use by default, e.g. "metric-40". */
  systemId: id,
  metadata: z
    .object({
      description: z.string().max(4000).optional(),
      customer: z.string().max(200).optional(),
      tags: z.array(z.string().max(40)).max(20).optional(),
    })
    .default({}),
  settings: designSettingsSchema.default(designSettingsSchema.parse({})),
  profiles: z.array(profileSchema).default([]),
  joints: z.array(jointSchema).default([]),
  panels: z.array(panelSchema).default([]),
  accessories: z.array(accessorySchema).default([]),
  subAssemblies: z.array(subAssemblySchema).default([]),
  steps: z.array(assemblyStepSchema).default([]),
  loadCases: z.array(loadCaseSchema).default([]),
});
export type DesignDocument = z.infer<typeof designDocumentSchema>;
/** The document as written by hand or by an older client: defaults not yet filled in. */
export type DesignDocumentInput = z.input<typeof designDocumentSchema>;
