/**
 * Catalogue types: profile systems, variants with their drawn cross-sections, connectors,
 * fasteners, T-nuts, panel materials, accessories and demo prices.
 *
 * Units: lengths mm, areas mm², second moments mm⁴, masses kg, mass per metre kg/m,
 * prices in the price list's currency (demo prices, invented).
 * Part codes ("SW-...") are Slotwise's own invented scheme.
 */
import type { ScrewHead, ScrewSize } from './fastenerStandards';
import type { Alloy, PanelMaterialSpec } from './materials';
import type { SectionProperties, Point2 } from '../structure/sectionProperties';
import type { AccessoryKind, JointKind, MachiningKind } from './partKinds';

export type { ScrewHead, ScrewSize } from './fastenerStandards';

/** The one list of profile system ids (the API contract's `systemIdSchema` is built from it). */
export const SYSTEM_IDS = ['inch-1.0', 'inch-1.5', 'metric-20', 'metric-30', 'metric-40', 'metric-45'] as const;
export type SystemId = (typeof SYSTEM_IDS)[number];

export type UnitFamily = 'inch' | 'metric';
export type TNutKind = 'drop-in' | 'slide-in';
export type AlloyId = Alloy['id'];

/** A T-nut that fits one system's slot. */
export interface TNutPart {
  id: string;
  partCode: string;
  systemId: SystemId;
  kind: TNutKind;
  name: string;
  /** Thread of the nut: the system's fastener size. */
  screwSize: ScrewSize;
  /** kg per piece. */
  unitMass: number;
  /** Demo price per piece, invented. */
  price: number;
}

/** A profile system: outer size, slot, fastener size and the T-nuts that fit. */
export interface ProfileSystem {
  id: SystemId;
  name: string;
  unitFamily: UnitFamily;
  /** Outer size of the square cell, mm. */
  outerSize: number;
  /** Slot opening width at the face, mm (common practice, approximate, no single source). */
  slotOpening: number;
  /** Thickness of the lips either side of the slot opening, mm (our own drawing). */
  slotLipThickness: number;
  /** Width of the undercut T-chamber behind the lips, mm (our own drawing). */
  slotChamberWidth: number;
  /** Depth of the slot from the face to the chamber floor, mm (common practice, approximate). */
  slotDepth: number;
  /** How far a captured panel reaches into the slot, per edge, mm (common practice, no source). */
  slotEngagement: number;
  /** Centre bore diameter, mm: the tap drill for `endTapSize` (common practice). */
  centreBoreDiameter: number;
  /** Thread tapped into the centre bore for end screws, feet and casters. */
  endTapSize: ScrewSize;
  /** The system's fastener size (T-nut thread). */
  screwSize: ScrewSize;
  /** T-nuts that fit this system's slot (ids into `catalogue.tNuts`). */
  tNutIds: string[];
  alloyId: AlloyId;
  /** Demo stock bar length, mm (demo value, invented). */
  demoStockLength: number;
  /** The square variant of this system. */
  defaultVariantId: string;
  /** Connector a generator uses for ordinary corners and T joints. */
  defaultConnectorId: string;
  /** Where the system's figures come from. */
  source: string;
}

/** A cross-section in mm centred on the origin, local x = width, local y = height. */
export interface CrossSection {
  outline: Point2[];
  holes: Point2[][];
}

/** Supplier's published figures that replace the computed ones (any subset). */
export interface SectionOverrides {
  area?: number;
  ix?: number;
  iy?: number;
  sx?: number;
  sy?: number;
  /** kg/m */
  massPerMetre?: number;
  /** Where the figures come from, e.g. a supplier's data sheet. Required so the screen can say so. */
  source: string;
}

/** One orderable extrusion: a system and a cross-section (square or multi-cell). */
export interface ProfileVariant {
  id: string;
  partCode: string;
  systemId: SystemId;
  name: string;
  /** Section size along local x, mm. */
  width: number;
  /** Section size along local y, mm (80 for the 40 x 80 variant). */
  height: number;
  /** Cells along local y: 1 for square variants, 2 for double-width. */
  cells: 1 | 2;
  crossSection: CrossSection;
  /** Properties computed from `crossSection` by polygonSectionProperties. */
  computedSectionProperties: SectionProperties;
  /** Properties in use: computed, with any overrides applied. */
  sectionProperties: SectionProperties;
  /** kg/m in use: area x alloy density unless overridden. */
  massPerMetre: number;
  overrides?: SectionOverrides;
  /** 'computed' or the overrides' source. */
  propertiesSource: string;
}

/** Machining a connector needs on the joined profile end (joint.members[0]). */
export interface ConnectorMachining {
  kind: MachiningKind;
  /** Distance from the joined end to the hole centre, mm (0 for an end tap). */
  offsetFromEnd: number;
  /** Hole diameter, or tap drill diameter for an end tap, mm. */
  diameter: number;
  /** For end taps: the thread. */
  tapSize?: ScrewSize;
  /**
   * 'joined' = on members[0] (the profile whose end is joined);
   * 'met' = on members[1] (the profile it meets), at the joint position;
   * 'each-end' = on every member that meets the joint with an end (corner cubes).
   */
  on: 'joined' | 'met' | 'each-end';
}

/** Screws a connector uses, per connector; the head follows joint.fastenerHead. */
export interface ConnectorFastenerUse {
  /** Default fastener id (button head); see `fastenerForHead` for another head. */
  fastenerId: string;
  quantity: number;
}

export interface Connector {
  id: string;
  partCode: string;
  kind: JointKind;
  name: string;
  systemIds: SystemId[];
  /** kg per connector (without screws or T-nuts). */
  unitMass: number;
  /** Demo price per connector, invented. */
  price: number;
  fasteners: ConnectorFastenerUse[];
  /** T-nuts per connector (kind follows joint.tNut). */
  tNutCount: number;
  machining: ConnectorMachining[];
  /** Slot length the connector occupies from the corner, mm: a captured panel needs a notch this long. */
  occupiedSlotLength: number;
  /** Concealed connectors: access counterbore for the hex key. */
  accessCounterbore?: { diameter: number; distanceFromEnd: number };
  /** End screws: the tapped end and the access hole in the met profile. */
  endScrew?: { tapSize: ScrewSize; tapDrillDiameter: number; accessHoleDiameter: number };
  /** Gusset plates: plate size, mm. */
  plate?: { width: number; height: number; thickness: number };
}

export interface Fastener {
  id: string;
  partCode: string;
  head: ScrewHead;
  size: ScrewSize;
  /** Under-head length (overall for flat head), mm. */
  length: number;
  /** Thread designation, e.g. '1/4-20' or 'M8 x 1.25'. */
  thread: string;
  name: string;
  /** From hexKeyFor(head, size). */
  hexKey: { label: string; mm: number; standard: string };
  /** kg per piece (estimate). */
  unitMass: number;
  /** Demo price per piece, invented. */
  price: number;
}

export interface PanelMaterial extends PanelMaterialSpec {
  /** Demo prices per m² by thickness, invented. */
  pricesPerSquareMetre: { thickness: number; price: number }[];
}

export interface AccessoryPart {
  id: string;
  partCode: string;
  kind: AccessoryKind;
  name: string;
  systemIds: SystemId[];
  /** 'each' or 'metre' (gasket, slot cover, door track are sold by the metre). */
  soldBy: 'each' | 'metre';
  /** kg per piece, or per metre when sold by the metre. */
  unitMass: number;
  /** Demo price per piece or per metre, invented. */
  price: number;
  /** Feet and casters thread into the tapped profile end. */
  threadSize?: ScrewSize;
  /** Screws used to mount it (per piece). */
  fasteners?: ConnectorFastenerUse[];
  /** T-nuts used to mount it (per piece). */
  tNutCount?: number;
  /** Demo rating, N per piece (casters, feet), invented: always defer to the supplier. */
  demoLoadRating?: number;
}

export interface PriceList {
  currency: string;
  /** Always shown with prices. */
  note: string;
  /** Price per metre of profile, by variant id. */
  profilePerMetre: Record<string, number>;
  /** Price per saw cut. */
  perCut: number;
  /** Price per machining operation, by kind. */
  perMachining: Record<MachiningKind, number>;
}

export interface Catalogue {
  systems: ProfileSystem[];
  variants: ProfileVariant[];
  connectors: Connector[];
  fasteners: Fastener[];
  tNuts: TNutPart[];
  panelMaterials: PanelMaterial[];
  accessories: AccessoryPart[];
  alloys: Alloy[];
  prices: PriceList;
}
