/**
 * The result of `analyzeDesign`: plain, JSON-serialisable data shared by the editor, the server
 * and the CLI. Lengths mm, masses kg, forces N, stresses MPa, money in `CostSummary.currency`.
 * Stable contract: fields are only ever added.
 */
import type { DesignOperation } from '../design/operations';
import type { StockPlan } from '../outputs/stockPlan';
import type { SystemStock } from '../design/schema';

export type Severity = 'error' | 'warning' | 'note';
export type Vec3Tuple = [number, number, number];

/** Names of the checks, as they appear in `Finding.check`. */
export type CheckName = 'joints' | 'panel-fit' | 'interference' | 'sequence' | 'structure' | 'frame-group';

export interface FindingFix {
  /** What the fix does, in words for a button ("Add an end cap"). */
  label: string;
  operation: DesignOperation;
}

export interface Finding {
  /** Stable for the same design: check + parts + reason. */
  id: string;
  check: CheckName | string;
  severity: Severity;
  /** Profiles, joints, panels or accessories the finding concerns; the first is the main one. */
  partIds: string[];
  message: string;
  fix?: FindingFix;
  /** Numbers behind the message (mm / N / MPa), for tables and tooltips. */
  data?: Record<string, number | string | boolean | null>;
}

export type BomCategory =
  | 'profile'
  | 'connector'
  | 'fastener'
  | 't-nut'
  | 'panel'
  | 'accessory'
  | 'gasket'
  | 'slot-cover';

export type BomUnit = 'pcs' | 'm' | 'm²';

export interface BomLine {
  /** Catalogue part code (profile variant id, connector id, fastener code, ...). */
  code: string;
  description: string;
  category: BomCategory;
  quantity: number;
  unit: BomUnit;
  /** kg per unit (per piece, per metre or per m²). */
  unitMass: number;
  /** Price per unit, in `CostSummary.currency`. */
  unitPrice: number;
  linePrice: number;
  lineMass: number;
  /** Profiles only: number of cut pieces behind the metres. */
  pieces?: number;
  /** The design parts this line counts. */
  partIds: string[];
}

export type EndTreatmentKind = 'plain' | 'tap' | 'cap' | 'foot' | 'caster';

export interface EndTreatment {
  kind: EndTreatmentKind;
  /** Thread for a tapped end, e.g. 'M8 x 1.25'. */
  thread?: string;
  description: string;
}

export interface CutMachiningOperation {
  id: string;
  kind: 'access-counterbore' | 'access-hole' | 'end-tap' | 'drill';
  fromEnd: 'start' | 'end';
  /** mm from the named end to the hole centre (0 for an end tap). */
  offset: number;
  face: number;
  diameter: number | null;
  description: string;
}

export interface CutListItem {
  /** Profile id. */
  id: string;
  label: string;
  variantId: string;
  length: number;
  /** ± mm, from settings.cutTolerance. */
  tolerance: number;
  ends: { start: EndTreatment; end: EndTreatment };
  machining: CutMachiningOperation[];
  /** Pieces with the same key are interchangeable. */
  groupKey: string;
}

export interface CutListGroup {
  groupKey: string;
  variantId: string;
  length: number;
  tolerance: number;
  quantity: number;
  profileIds: string[];
  ends: { start: EndTreatment; end: EndTreatment };
  machining: CutMachiningOperation[];
}

export interface VariantStockPlan {
  variantId: string;
  /** The profile system whose stock settings apply. */
  systemId?: string;
  /** Cuts packed into new bars; `plan.lowerBound` counts bars of the longest length. */
  plan: StockPlan;
  /** The stock settings in force for this system. */
  settings?: SystemStock;
  /** Length and price of each bar in `plan.bars`, in order (a mix when shorter bars are cheaper). */
  barStock?: { length: number; cost: number }[];
  /** Offcuts on hand used before new bars, with the cuts placed in them (mm). */
  offcutsUsed?: { length: number; cuts: StockPlan['bars'][number]['cuts']; left: number }[];
  /** Price of the new bars, demo prices. */
  cost?: number;
  /** No plan costs less: total cut length with kerfs at the cheapest price per usable mm. */
  costLowerBound?: number;
}

export type ToolKind = 'hex-key' | 'drill' | 'tap' | 'mallet' | 'square' | 'saw' | 'other';

export interface ToolItem {
  id: string;
  kind: ToolKind;
  name: string;
  /** Size in the tool's own terms ('5 mm', '5/32 in', 'M8 x 1.25'). */
  size?: string;
  /** Standard the size comes from, e.g. 'ISO 4762'. */
  standard?: string;
  /** Why the build needs it. */
  reason: string;
}

export interface MassSummary {
  /** kg */
  total: number;
  byCategory: Record<string, number>;
  /** mm; [0,0,0] for an empty design. */
  centreOfMass: Vec3Tuple;
  /** mm */
  overallSize: { x: number; y: number; z: number };
  boundingBox: { min: Vec3Tuple; max: Vec3Tuple };
}

export type CostCategory = BomCategory | 'cutting' | 'machining';

export interface CostLine {
  code: string;
  description: string;
  category: CostCategory;
  quantity: number;
  unit: BomUnit;
  unitPrice: number;
  linePrice: number;
}

export interface CostSummary {
  lines: CostLine[];
  subtotalByCategory: Partial<Record<CostCategory, number>>;
  total: number;
  currency: 'USD';
  note: 'demo prices';
}

export interface MemberResult {
  profileId: string;
  /** mm, between supports. */
  span: number;
  support: 'simple' | 'fixed';
  beamCase: string;
  /** N, total on the member in this load case. */
  load: number;
  /** mm⁴, about the axis the load bends the member around. */
  secondMoment: number;
  /** mm³ */
  sectionModulus: number;
  maxMoment: number;
  /** mm */
  maxDeflection: number;
  /** mm, span / settings.deflectionLimitRatio. */
  deflectionLimit: number;
  deflectionOk: boolean;
  /** MPa */
  maxStress: number;
  /** MPa, alloy minimum yield / safety factor. */
  allowableStress: number;
  stressOk: boolean;
}

export interface LegResult {
  profileId: string;
  length: number;
  /** End condition used for the buckling length: pinned at the floor, with sway when the frame is unbraced. */
  endCondition: string;
  effectiveLengthFactor: number;
  /** N, this leg's share (by statics, from where the loads sit) of the vertical loads and the frame's weight. */
  load: number;
  /** N, Euler's π²EI/(KL)², for reference. */
  criticalLoad: number;
  /** N, A·f₀: no column carries more. */
  squashLoad: number;
  /** EN 1999-1-1 §6.3.1 reduction factor χ. */
  chi: number;
  /** N, χ·A·f₀ (EN 1999-1-1 §6.3.1), at most `squashLoad`. */
  bucklingLoad: number;
  /** load / (bucklingLoad / safety factor). */
  utilisation: number;
  /** N·mm, bending at the leg's top from side loads on an unbraced frame. */
  bendingMoment: number;
  /** EN 1999-1-1 §6.3.3 axial + bending left-hand side (1 = limit), with the safety factor. */
  combinedUtilisation: number;
  /** The foot or caster under the leg and its rating, N, if there is one. */
  support?: { accessoryId: string; rating: number | null };
  ok: boolean;
}

/** The load through one joint, against what its connectors hold before they slip. */
export interface JointLoadResult {
  jointId: string;
  /** The loaded member the reaction comes from. */
  profileId: string;
  /** N, the member's end reaction at this joint. */
  reaction: number;
  /** N, slip (or screw shear) capacity of the joint's connectors for this member, before the safety factor. */
  capacity: number;
  /** N, capacity / safety factor. */
  allowable: number;
  mode: 'slip' | 'screw-shear';
  ok: boolean;
}

/** Deflection of a loaded panel (shelf). */
export interface PanelSagResult {
  panelId: string;
  method: 'plate-simply-supported' | 'one-way-strip';
  /** mm */
  span: number;
  /** mm */
  deflection: number;
  /** mm, span / settings.deflectionLimitRatio. */
  limit: number;
  /** MPa, the sheet's modulus used. */
  elasticModulus: number;
  ok: boolean;
}

/** Side loads on a frame with nothing against racking. */
export interface RackingResult {
  /** Plan directions the frame has a brace, gusset or panel against racking in. */
  bracedX: boolean;
  bracedZ: boolean;
  /** N, horizontal load in this load case along x and z. */
  sideLoadX: number;
  sideLoadZ: number;
}

/** A load the structure estimate could not place. */
export interface StructureProblem {
  reason: 'unsupported' | 'unknown-load-target' | 'panel-unsupported';
  partIds: string[];
  /** N */
  force?: number;
}

export interface TipOverResult {
  /** mm above the floor. */
  pushHeight: number;
  /** N, frame weight plus vertical loads. */
  weight: number;
  /** mm, the shortest horizontal distance from the centre of mass to a footprint edge. */
  leverArm: number;
  /** N, horizontal push at pushHeight that starts to tip the frame. */
  force: number;
  /** The footprint edge it tips over ('front' is −Z). */
  edge: string;
  /** N, the push the frame should resist (0 when the standard sets no push for a frame this low). */
  threshold: number;
  /** 'feet' when feet or casters mark the footprint, else 'profiles'. */
  footprint: 'feet' | 'profiles';
}

export interface StructureResult {
  loadCaseId: string;
  loadCaseName: string;
  members: MemberResult[];
  legs: LegResult[];
  tipOver: TipOverResult | null;
  joints: JointLoadResult[];
  panels: PanelSagResult[];
  racking: RackingResult;
  problems: StructureProblem[];
  /** The settings in force for this estimate. */
  settings: { safetyFactor: number; deflectionLimitRatio: number; alloyId: string; minYield: number };
  cautions: string[];
}

/** Tip-over of the empty frame and of the worst load case, pushed at the top edge. */
export interface StabilityResult {
  empty: TipOverResult | null;
  worst: (TipOverResult & { loadCaseId: string; loadCaseName: string }) | null;
}

/** Size to cut a panel: captured panels include slot engagement and clearance. */
export interface PanelCutItem {
  panelId: string;
  materialId: string;
  thickness: number;
  width: number;
  height: number;
  mounting: 'captured' | 'face';
  /** Corner notch (square, mm) needed where a connector sits in the slot, else 0. */
  cornerNotch: number;
  notchedCorners: number;
}

export interface DesignAnalysis {
  /** At most 200 per check (findingCap.ts); a closing `<check>:more` finding counts the rest. */
  findings: Finding[];
  /** Findings found but not listed (absent when none were left out). */
  omittedFindings?: number;
  /** Every finding by severity, listed or not. */
  counts: { error: number; warning: number; note: number };
  bom: BomLine[];
  cutList: CutListItem[];
  cutGroups: CutListGroup[];
  /** One plan per profile variant. */
  stockPlans: VariantStockPlan[];
  panelCuts: PanelCutItem[];
  tools: ToolItem[];
  mass: MassSummary;
  cost: CostSummary;
  structure: StructureResult[];
  /** Tip-over, always: the empty frame and the worst load case. */
  stability: StabilityResult;
  timingsMs?: Record<string, number>;
}
