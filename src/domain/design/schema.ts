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
import { unsafeTextReason, type SafeTextOptions } from '../text/safeText';

/**
 * The Slotwise design document, version 2 (version 2 adds the assembly sequence fields: a step's
 * kind, build orientation and caution, and whether the designer edited the order).
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

export const CURRENT_SCHEMA_VERSION = 3 as const;

const id = z
  .string()
  .min(1, 'An id cannot be empty')
  .max(64, 'An id is at most 64 characters')
  .regex(/^[A-Za-z0-9_.:-]+$/, 'An id may use letters, digits and _ . : - only');

/**
 * Bounds of a design document (docs/design-format.md, "Limits"). They keep every number a real
 * frame could have and refuse the absurd ones (1e300 mm, 1e-300 mm) that would overflow the
 * analysis or make grid walks run for minutes. Lengths in mm, forces in N.
 */
export const DESIGN_LIMITS = {
  /** Longest profile, panel side, offset or stock bar, mm (20 m). */
  maxLengthMm: 20_000,
  /** Smallest length, thickness or diameter, mm. */
  minLengthMm: 0.01,
  /** Every coordinate lies within ±100 m of the origin, mm. */
  maxCoordinateMm: 100_000,
  /** Largest single load, N (1 MN). */
  maxForceN: 1_000_000,
  maxProfiles: 10_000,
  maxJoints: 40_000,
  maxPanels: 5_000,
  maxAccessories: 40_000,
  maxSubAssemblies: 1_000,
  maxSteps: 10_000,
  maxLoadCases: 100,
  maxLoadsPerCase: 500,
  maxMachiningPerProfile: 100,
  maxCutoutsPerPanel: 200,
} as const;

const L = DESIGN_LIMITS;
const thousands = (n: number) => n.toLocaleString('en-US');

// z.number() itself refuses NaN and ±Infinity (zod 4); the bounds below keep numbers sane as well.
const finite = z.number();
const positiveMm = finite
  .min(L.minLengthMm, `Must be at least ${L.minLengthMm} mm`)
  .max(L.maxLengthMm, `Must be at most ${thousands(L.maxLengthMm)} mm (20 m)`);
const nonNegativeMm = finite.min(0, 'Cannot be negative').max(L.maxLengthMm, `Must be at most ${thousands(L.maxLengthMm)} mm (20 m)`);
const coordinateMm = finite
  .min(-L.maxCoordinateMm, `Must be within ±${thousands(L.maxCoordinateMm)} mm (100 m) of the origin`)
  .max(L.maxCoordinateMm, `Must be within ±${thousands(L.maxCoordinateMm)} mm (100 m) of the origin`);
const offsetMm = finite
  .min(-L.maxLengthMm, `Must be within ±${thousands(L.maxLengthMm)} mm`)
  .max(L.maxLengthMm, `Must be within ±${thousands(L.maxLengthMm)} mm`);
const forceN = finite.gt(0, 'Must be greater than 0 N').max(L.maxForceN, `Must be at most ${thousands(L.maxForceN)} N`);
const list = <T extends z.ZodType>(item: T, max: number, what: string) => z.array(item).max(max, `At most ${thousands(max)} ${what}`);

/** Text shown to people: no control, invisible-only, direction-override or broken characters (see safeText.ts). */
const safeText = (max: number, options: SafeTextOptions = {}) =>
  z
    .string()
    .max(max, `At most ${max} characters`)
    .superRefine((text, ctx) => {
      const reason = unsafeTextReason(text, options);
      if (reason) ctx.addIssue({ code: 'custom', message: reason });
    });

export const vec3Schema = z.tuple([finite, finite, finite]);
/** A point in space, mm, within ±100 m of the origin. */
export const pointSchema = z.tuple([coordinateMm, coordinateMm, coordinateMm]);
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
  start: pointSchema,
  direction: unitVectorSchema,
  rollDeg: finite.min(-360, 'Use a roll between -360° and 360°').max(360, 'Use a roll between -360° and 360°').default(0),
  label: safeText(80).optional(),
  machining: list(machiningSchema, L.maxMachiningPerProfile, 'machining operations per profile').default([]),
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
  u: offsetMm,
  v: offsetMm,
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
    center: pointSchema,
    normal: axisSchema,
    width: positiveMm,
    height: positiveMm,
  }),
  cutouts: list(cutoutSchema, L.maxCutoutsPerPanel, 'cut-outs per panel').default([]),
  label: safeText(80).optional(),
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
export type BuildOrientation = z.infer<typeof buildOrientationSchema>;

/**
 * What a step does: place parts, slide captured panels or T-nuts into open slots, turn the piece
 * over, join a finished sub-assembly, or finish (feet, caps, gaskets).
 */
export const stepKindSchema = z.enum(['place', 'slide-in', 'flip', 'join', 'finish']);
export type StepKind = z.infer<typeof stepKindSchema>;

export const subAssemblySchema = z.object({
  id,
  name: safeText(80),
  profileIds: z.array(id).default([]),
  panelIds: z.array(id).default([]),
  buildOrientation: buildOrientationSchema.default('as-placed'),
  /** Direction the finished sub-assembly moves to be joined to the rest. */
  joinDirection: unitVectorSchema.optional(),
});
export type SubAssembly = z.infer<typeof subAssemblySchema>;

export const assemblyStepSchema = z.object({
  id,
  title: safeText(120),
  /** Ids of profiles, joints, panels or accessories placed in this step. */
  partIds: z.array(id).default([]),
  subAssemblyId: id.optional(),
  insertionDirection: unitVectorSchema.optional(),
  notes: safeText(2000, { multiline: true, allowEmpty: true }).optional(),
  /** Version 2: what the step does (see stepKindSchema). */
  kind: stepKindSchema.default('place'),
  /** Version 2: the orientation the piece is in during this step; omitted = the sub-assembly's build orientation. */
  orientation: buildOrientationSchema.optional(),
  /** Version 2: a caution the designer wrote for this step (derived cautions are added by the core). */
  caution: safeText(500, { multiline: true, allowEmpty: true }).optional(),
});
export type AssemblyStep = z.infer<typeof assemblyStepSchema>;

export const loadSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('point'),
    profileId: id,
    /** Distance from the profile start, mm. */
    along: nonNegativeMm,
    /** Force, newtons (positive, acting along `direction`). */
    force: forceN,
    direction: unitVectorSchema.default([0, -1, 0]),
  }),
  z.object({
    kind: z.literal('uniform'),
    /** A panel (load shared by its supporting profiles) or one profile. */
    panelId: id.optional(),
    profileId: id.optional(),
    /** Total force, newtons, spread evenly. */
    totalForce: forceN,
  }),
]);
export type Load = z.infer<typeof loadSchema>;

export const loadCaseSchema = z.object({
  id,
  name: safeText(80),
  loads: list(loadSchema, L.maxLoadsPerCase, 'loads per load case').default([]),
  /** Beam end condition: simply supported is the conservative default. */
  support: z.enum(['simple', 'fixed']).default('simple'),
  /** Tip-over: horizontal push at this height above the floor, mm. */
  tipOverHeight: positiveMm.optional(),
});
export type LoadCase = z.infer<typeof loadCaseSchema>;

/** Stock bars one profile system is bought in: lengths with a price per bar, and the saw settings. */
export const systemStockSchema = z.object({
  bars: z
    .array(z.object({ length: positiveMm, cost: z.number().finite().min(0) }))
    .min(1, 'Give at least one bar length')
    .max(8),
  kerf: nonNegativeMm.default(3),
  /** Squared off each bar end before cutting, mm; each trimmed end also costs a kerf. */
  trimStart: nonNegativeMm.default(5),
  trimEnd: nonNegativeMm.default(5),
  minReusableOffcut: nonNegativeMm.default(150),
});
export type SystemStock = z.infer<typeof systemStockSchema>;

/** A piece of profile already on the shelf, used before new bars are cut. */
export const offcutOnHandSchema = z.object({
  variantId: id,
  length: positiveMm,
  quantity: z.number().int().min(1).max(1000).default(1),
});
export type OffcutOnHand = z.infer<typeof offcutOnHandSchema>;

/**
 * A frame group: the parts a frame starter made, with the parameters that made them (mm), so
 * changing a parameter regenerates those parts. `partIds` lists every top-level id the starter
 * made (profiles, joints, panels, accessories, sub-assemblies, steps, load cases); `origin` is
 * where the starter's own origin sits in the design. `unfit` lists the parts added by hand that
 * the last regeneration had to take out, with the reason, for the frame-group check to report.
 */
export const frameGroupSchema = z.object({
  id,
  name: z.string().min(1).max(80),
  /** The starter that made it, e.g. "table". */
  generatorId: id,
  /** The starter's parameters, lengths in mm. */
  params: z.record(z.string().max(64), z.union([z.number(), z.string().max(200), z.boolean(), z.null()])),
  origin: vec3Schema.default([0, 0, 0]),
  partIds: z.array(id).max(20000).default([]),
  unfit: z
    .array(z.object({ label: z.string().max(200), reason: z.string().max(400) }))
    .max(200)
    .default([]),
});
export type FrameGroup = z.infer<typeof frameGroupSchema>;

export const designSettingsSchema = z.object({
  alloyId: id.default('6063-T5'),
  /** Bar length for the design's own system, mm; left at 3,000 the system's own bar lengths apply. */
  stockLength: positiveMm.default(3000),
  kerf: nonNegativeMm.default(3),
  /** Trimmed off each bar end, mm (each trimmed end also costs a kerf). */
  endTrim: nonNegativeMm.default(5),
  /** Stock per profile system, by system id; systems not named here use their own defaults. */
  stockBySystem: z.record(id, systemStockSchema).optional(),
  /** Offcuts on hand, used before new bars. */
  offcutsOnHand: z.array(offcutOnHandSchema).max(500).optional(),
  minReusableOffcut: nonNegativeMm.default(150),
  /** Clearance subtracted from a captured panel's size, total per direction, mm. */
  panelClearance: nonNegativeMm.default(1),
  cutTolerance: nonNegativeMm.default(0.5),
  safetyFactor: finite.min(1, 'A safety factor is at least 1').max(100, 'A safety factor is at most 100').default(2),
  deflectionLimitRatio: finite.gt(0, 'Must be positive').max(100_000, 'Use a ratio of at most 100,000').default(360),
});
export type DesignSettings = z.infer<typeof designSettingsSchema>;

export const designDocumentSchema = z.object({
  schemaVersion: z.literal(CURRENT_SCHEMA_VERSION),
  name: z.string().trim().min(1, 'A design needs a name').pipe(safeText(120)),
  units: z.enum(LENGTH_UNITS).default('mm'),
  /** The profile system new profiles use by default, e.g. "metric-40". */
  systemId: id,
  metadata: z
    .object({
      description: safeText(4000, { multiline: true, allowEmpty: true }).optional(),
      customer: safeText(200, { allowEmpty: true }).optional(),
      tags: z.array(safeText(40)).max(20).optional(),
    })
    .default({}),
  settings: designSettingsSchema.default(designSettingsSchema.parse({})),
  profiles: list(profileSchema, L.maxProfiles, 'profiles').default([]),
  joints: list(jointSchema, L.maxJoints, 'joints').default([]),
  panels: list(panelSchema, L.maxPanels, 'panels').default([]),
  accessories: list(accessorySchema, L.maxAccessories, 'accessories').default([]),
  subAssemblies: list(subAssemblySchema, L.maxSubAssemblies, 'sub-assemblies').default([]),
  /** The assembly sequence in build order (version 2 saves the designer's order with each revision). */
  steps: list(assemblyStepSchema, L.maxSteps, 'assembly steps').default([]),
  /** Version 2: true once the designer changed the generated order; regenerating then asks first. */
  sequenceEdited: z.boolean().default(false),
  loadCases: list(loadCaseSchema, L.maxLoadCases, 'load cases').default([]),
  /** Frame groups made by the starters; absent in documents made before they existed. */
  frameGroups: list(frameGroupSchema, 1000, 'frame groups').optional(),
});
export type DesignDocument = z.infer<typeof designDocumentSchema>;
/** The document as written by hand or by an older client: defaults not yet filled in. */
export type DesignDocumentInput = z.input<typeof designDocumentSchema>;
