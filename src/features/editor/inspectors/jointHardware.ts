import { defaultCatalogue, getConnector, type Catalogue } from '@/domain/catalogue';
import { jointRecipe } from '@/domain/design/jointHardware';
import type { DesignDocument, Joint } from '@/domain/design/schema';

export interface HardwareLine {
  name: string;
  quantity: number;
}

/**
 * What one joint brings: connectors, screws (with their hex key) and T-nuts, counted. The parts come
 * from the domain's one recipe (`jointRecipe`), the same the bill of materials uses; `hostSystemId`
 * is the system whose slot takes the T-nuts (see `jointHostSystemId`).
 */
export function jointHardware(
  joint: Pick<Joint, 'connectorId' | 'fastenerHead' | 'tNut' | 'quantity'>,
  hostSystemId: string,
  catalogue: Catalogue = defaultCatalogue,
) {
  const connector = getConnector(catalogue, joint.connectorId);
  if (!connector) return { connector: undefined, lines: [] as HardwareLine[], hexKeys: [] as string[] };
  const lines: HardwareLine[] = [];
  const hexKeys = new Set<string>();
  for (const item of jointRecipe(catalogue, joint, hostSystemId)) {
    lines.push({ name: item.part.name, quantity: item.perConnector * joint.quantity });
    if ('hexKey' in item.part) hexKeys.add(item.part.hexKey.label);
  }
  return { connector, lines, hexKeys: [...hexKeys] };
}

/** The machining on the design's profiles that exists for this joint. */
export function jointMachining(design: DesignDocument, jointId: string) {
  return design.profiles.flatMap((profile) =>
    profile.machining.filter((operation) => operation.jointId === jointId).map((operation) => ({ profileId: profile.id, operation })),
  );
}
