/**
 * The default catalogue and lookups. `get*` return undefined for an unknown id; `require*`
 * throw with a message naming the id. Prices are demo prices, invented.
 */
import { alloys, getAlloy } from './materials';
import { panelMaterialSpecs } from './materials';
import { buildConnectors } from './connectors';
import { buildFasteners } from './fasteners';
import { buildAccessories, buildPanelMaterials, buildPriceList, buildTNuts } from './parts';
import { profileSystems } from './systems';
import type {
  AccessoryPart,
  Catalogue,
  Connector,
  ConnectorFastenerUse,
  Fastener,
  PanelMaterial,
  ProfileSystem,
  ProfileVariant,
  ScrewHead,
  TNutKind,
  TNutPart,
} from './types';
import type { AccessoryKind, JointKind } from './partKinds';
import { buildVariants } from './variants';

export * from './types';
export { applySectionOverrides, massPerMetre } from './variants';
export { panelPricePerSquareMetre, DEMO_PRICE_NOTE } from './parts';
export { SYSTEM_PREFIX, squareVariantId } from './systems';
export { fastenerId } from './fasteners';

function buildDefaultCatalogue(): Catalogue {
  const systems = profileSystems;
  const variants = buildVariants(systems, (id) => getAlloy(id).density);
  return {
    systems,
    variants,
    connectors: buildConnectors(systems),
    fasteners: buildFasteners(),
    tNuts: buildTNuts(systems),
    panelMaterials: buildPanelMaterials(panelMaterialSpecs),
    accessories: buildAccessories(systems),
    alloys,
    prices: buildPriceList(variants),
  };
}

export const defaultCatalogue: Catalogue = buildDefaultCatalogue();

const find = <T extends { id: string }>(list: T[], id: string): T | undefined => list.find((x) => x.id === id);

export function getSystem(catalogue: Catalogue, id: string): ProfileSystem | undefined {
  return find(catalogue.systems, id);
}
export function getVariant(catalogue: Catalogue, id: string): ProfileVariant | undefined {
  return find(catalogue.variants, id);
}
export function getConnector(catalogue: Catalogue, id: string): Connector | undefined {
  return find(catalogue.connectors, id);
}
export function getFastener(catalogue: Catalogue, id: string): Fastener | undefined {
  return find(catalogue.fasteners, id);
}
export function getTNut(catalogue: Catalogue, id: string): TNutPart | undefined {
  return find(catalogue.tNuts, id);
}
export function getPanelMaterial(catalogue: Catalogue, id: string): PanelMaterial | undefined {
  return find(catalogue.panelMaterials, id);
}
export function getAccessoryPart(catalogue: Catalogue, id: string): AccessoryPart | undefined {
  return find(catalogue.accessories, id);
}

function required<T>(value: T | undefined, what: string, id: string): T {
  if (value === undefined) throw new Error(`The catalogue has no ${what} "${id}"`);
  return value;
}
export const requireSystem = (c: Catalogue, id: string) => required(getSystem(c, id), 'profile system', id);
export const requireVariant = (c: Catalogue, id: string) => required(getVariant(c, id), 'profile variant', id);
export const requireConnector = (c: Catalogue, id: string) => required(getConnector(c, id), 'connector', id);

/** Variants of one system, square first. */
export function variantsForSystem(catalogue: Catalogue, systemId: string): ProfileVariant[] {
  return catalogue.variants.filter((v) => v.systemId === systemId).sort((a, b) => a.cells - b.cells);
}

/** The system's connector of a joint kind (each system has one of each kind). */
export function connectorFor(catalogue: Catalogue, systemId: string, kind: JointKind): Connector | undefined {
  return catalogue.connectors.find((c) => c.kind === kind && c.systemIds.includes(systemId as ProfileSystem['id']));
}

/** The system's accessory of a kind. */
export function accessoryFor(catalogue: Catalogue, systemId: string, kind: AccessoryKind): AccessoryPart | undefined {
  return catalogue.accessories.find((a) => a.kind === kind && a.systemIds.includes(systemId as ProfileSystem['id']));
}

/** The system's T-nut of a kind. */
export function tNutFor(catalogue: Catalogue, systemId: string, kind: TNutKind): TNutPart | undefined {
  return catalogue.tNuts.find((t) => t.systemId === systemId && t.kind === kind);
}

/** The same screw (size, length) with another head; falls back to the listed fastener. */
export function fastenerWithHead(catalogue: Catalogue, fastenerIdToMatch: string, head: ScrewHead): Fastener | undefined {
  const base = getFastener(catalogue, fastenerIdToMatch);
  if (!base) return undefined;
  return (
    catalogue.fasteners.find((f) => f.head === head && f.size === base.size && Math.abs(f.length - base.length) < 0.01) ?? base
  );
}

/**
 * Screws one connector uses with the joint's chosen head. Screws into a tapped end keep their
 * socket head (a button head does not fit a counterbore key reach), slot screws follow the choice.
 */
export function connectorFasteners(
  catalogue: Catalogue,
  connector: Connector,
  head: ScrewHead,
): { fastener: Fastener; quantity: number }[] {
  return connector.fasteners.flatMap((use: ConnectorFastenerUse) => {
    const listed = getFastener(catalogue, use.fastenerId);
    if (!listed) return [];
    const fastener = listed.head === 'socket' ? listed : (fastenerWithHead(catalogue, use.fastenerId, head) ?? listed);
    return [{ fastener, quantity: use.quantity }];
  });
}

/** The system a variant belongs to. */
export function systemOfVariant(catalogue: Catalogue, variantId: string): ProfileSystem | undefined {
  const v = getVariant(catalogue, variantId);
  return v ? getSystem(catalogue, v.systemId) : undefined;
}
