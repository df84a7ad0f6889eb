/**
 * The one joint-hardware recipe: what one connector of a joint brings (the connector, its screws
 * with the joint's head style, and T-nuts of the host profile's system). The bill of materials and
 * the editor's joint inspector both read it, so they always list the same parts.
 */
import { connectorFasteners, getConnector, getVariant, tNutFor } from '../catalogue';
import type { Catalogue, Connector, Fastener, TNutPart } from '../catalogue/types';
import type { DesignDocument, Joint } from './schema';

export interface JointRecipeItem {
  category: 'connector' | 'fastener' | 't-nut';
  part: Connector | Fastener | TNutPart;
  /** Pieces per connector; multiply by the joint's quantity. */
  perConnector: number;
}

export type JointRecipeInput = Pick<Joint, 'connectorId' | 'fastenerHead' | 'tNut'>;

/**
 * The system whose slot takes the joint's T-nuts: that of the second member (the host the connector
 * bolts onto), else the first member's, else the design's.
 */
export function jointHostSystemId(design: Pick<DesignDocument, 'profiles' | 'systemId'>, joint: Pick<Joint, 'members'>, catalogue: Catalogue): string {
  const profileOf = (index: number) => {
    const id = joint.members[index]?.profileId;
    return id === undefined ? undefined : design.profiles.find((profile) => profile.id === id);
  };
  const host = profileOf(1) ?? profileOf(0);
  return (host && getVariant(catalogue, host.variantId)?.systemId) ?? design.systemId;
}

/** The parts one connector of this joint brings; empty for an unknown connector. Counts are pieces. */
export function jointRecipe(catalogue: Catalogue, joint: JointRecipeInput, hostSystemId: string): JointRecipeItem[] {
  const connector = getConnector(catalogue, joint.connectorId);
  if (!connector) return [];
  const items: JointRecipeItem[] = [];
  // End-screw "connectors" are the screw itself: no separate part to list.
  if (connector.unitMass > 0 || connector.price > 0) items.push({ category: 'connector', part: connector, perConnector: 1 });
  for (const { fastener, quantity } of connectorFasteners(catalogue, connector, joint.fastenerHead)) {
    items.push({ category: 'fastener', part: fastener, perConnector: quantity });
  }
  const nut = connector.tNutCount > 0 ? tNutFor(catalogue, hostSystemId, joint.tNut) : undefined;
  if (nut) items.push({ category: 't-nut', part: nut, perConnector: connector.tNutCount });
  return items;
}
