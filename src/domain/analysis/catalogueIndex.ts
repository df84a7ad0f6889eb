/** Catalogue lookups by id, built once per catalogue object (no linear searches in the checks). */
import type {
  AccessoryPart,
  Catalogue,
  Connector,
  Fastener,
  PanelMaterial,
  ProfileSystem,
  ProfileVariant,
  TNutPart,
} from '../catalogue/types';
import type { Alloy } from '../catalogue/materials';

export interface CatalogueIndex {
  catalogue: Catalogue;
  variants: Map<string, ProfileVariant>;
  systems: Map<string, ProfileSystem>;
  connectors: Map<string, Connector>;
  fasteners: Map<string, Fastener>;
  /** `${head}|${size}|${length}` → fastener, to swap a connector's default screw for another head. */
  fastenersByShape: Map<string, Fastener>;
  tNuts: Map<string, TNutPart>;
  /** `${systemId}|${kind}` → T-nut. */
  tNutsBySystemKind: Map<string, TNutPart>;
  panelMaterials: Map<string, PanelMaterial>;
  accessories: Map<string, AccessoryPart>;
  /** `${systemId}|${kind}` → accessory part. */
  accessoriesBySystemKind: Map<string, AccessoryPart>;
  alloys: Map<string, Alloy>;
}

const cache = new WeakMap<Catalogue, CatalogueIndex>();

function byId<T extends { id: string }>(items: readonly T[]): Map<string, T> {
  const map = new Map<string, T>();
  for (const item of items) map.set(item.id, item);
  return map;
}

export function indexCatalogue(catalogue: Catalogue): CatalogueIndex {
  const cached = cache.get(catalogue);
  if (cached) return cached;
  const fastenersByShape = new Map<string, Fastener>();
  for (const f of catalogue.fasteners) fastenersByShape.set(`${f.head}|${f.size}|${f.length}`, f);
  const tNutsBySystemKind = new Map<string, TNutPart>();
  for (const t of catalogue.tNuts) {
    const key = `${t.systemId}|${t.kind}`;
    if (!tNutsBySystemKind.has(key)) tNutsBySystemKind.set(key, t);
  }
  const accessoriesBySystemKind = new Map<string, AccessoryPart>();
  for (const a of catalogue.accessories) {
    for (const systemId of a.systemIds) {
      const key = `${systemId}|${a.kind}`;
      if (!accessoriesBySystemKind.has(key)) accessoriesBySystemKind.set(key, a);
    }
  }
  const index: CatalogueIndex = {
    catalogue,
    variants: byId(catalogue.variants),
    systems: byId(catalogue.systems),
    connectors: byId(catalogue.connectors),
    fasteners: byId(catalogue.fasteners),
    fastenersByShape,
    tNuts: byId(catalogue.tNuts),
    tNutsBySystemKind,
    panelMaterials: byId(catalogue.panelMaterials),
    accessories: byId(catalogue.accessories),
    accessoriesBySystemKind,
    alloys: byId(catalogue.alloys),
  };
  cache.set(catalogue, index);
  return index;
}

