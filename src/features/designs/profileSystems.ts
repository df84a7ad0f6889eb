import { defaultCatalogue } from '@/domain/catalogue';

/** The profile systems a new design can start from, as the catalogue names them. */
export interface ProfileSystemOption {
  id: string;
  name: string;
}

export const PROFILE_SYSTEMS: readonly ProfileSystemOption[] = defaultCatalogue.systems.map(({ id, name }) => ({ id, name }));

/** A readable label for a system id; unknown ids are shown as they are. */
export function profileSystemLabel(systemId: string): string {
  return PROFILE_SYSTEMS.find((system) => system.id === systemId)?.name ?? systemId;
}
