import { connectorFasteners, defaultCatalogue, getConnector, tNutFor, type Catalogue } from '@/domain/catalogue';
import type { DesignDocument, Joint } from '@/domain/design/schema';

export interface HardwareLine {
  name: string;
  quantity: number;
}

/** What one joint brings: connectors, screws (with their hex key) and T-nuts, counted. */
export function jointHardware(joint: Pick<Joint, 'connectorId' | 'fastenerHead' | 'tNut' | 'quantity'>, catalogue: Catalogue = defaultCatalogue) {
  const connector = getConnector(catalogue, joint.connectorId);
  if (!connector) return { connector: undefined, lines: [] as HardwareLine[], hexKeys: [] as string[] };
  const lines: HardwareLine[] = [{ name: connector.name, quantity: joint.quantity }];
  const hexKeys = new Set<string>();
  for (const { fastener, quantity } of connectorFasteners(catalogue, connector, joint.fastenerHead)) {
    lines.push({ name: fastener.name, quantity: quantity * joint.quantity });
    hexKeys.add(fastener.hexKey.label);
  }
  if (connector.tNutCount > 0) {
    const nut = tNutFor(catalogue, connector.systemIds[0], joint.tNut);
    lines.push({ name: nut?.name ?? `${joint.tNut} T-nut`, quantity: connector.tNutCount * joint.quantity });
  }
  return { connector, lines, hexKeys: [...hexKeys] };
}

/** The machining on the design's profiles that exists for this joint. */
export function jointMachining(design: DesignDocument, jointId: string) {
  return design.profiles.flatMap((profile) =>
    profile.machining.filter((operation) => operation.jointId === jointId).map((operation) => ({ profileId: profile.id, operation })),
  );
}
