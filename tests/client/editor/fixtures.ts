import { designDocumentSchema, type DesignDocument, type Profile } from '@/domain/design/schema';
import type { EditorCommand } from '@/features/editor/commands/EditorCommand';

/** A small frame: two 500 mm rails along X, 40 mm apart in Y. */
export function twoRailDesign(): DesignDocument {
  return designDocumentSchema.parse({
    schemaVersion: 2,
    name: 'Two rails',
    systemId: 'metric-40',
    profiles: [
      { id: 'p1', variantId: 'm40-40x40', length: 500, start: [0, 0, 0], direction: [1, 0, 0] },
      { id: 'p2', variantId: 'm40-40x40', length: 500, start: [0, 400, 0], direction: [1, 0, 0] },
    ],
  });
}

/** A test-only command that appends a profile (apply) and removes it again (undo). */
export function addProfileCommand(profile: Omit<Profile, 'machining' | 'rollDeg'>): EditorCommand {
  const full: Profile = { rollDeg: 0, machining: [], ...profile };
  return {
    label: `Add ${profile.id}`,
    apply: (design) => ({ ...design, profiles: [...design.profiles, full] }),
    undo: (design) => ({ ...design, profiles: design.profiles.filter((p) => p.id !== profile.id) }),
    toJSON: () => ({ type: 'add-profile', profile: full }),
  };
}

export function clone<T>(value: T): T {
  return structuredClone(value);
}
