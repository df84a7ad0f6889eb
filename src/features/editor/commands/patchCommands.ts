import type { DesignDocument, Joint, Panel, Profile } from '@/domain/design/schema';
import { CommandRefusedError, type EditorCommand } from './EditorCommand';

/**
 * Field edits on one part, with exact undo: the command keeps the old values of the fields it
 * changed, so undo restores them (and nothing else) even after later, unrelated edits.
 */
export function updateProfileCommand(label: string, profileId: string, patch: Partial<Omit<Profile, 'id'>>): EditorCommand {
  return updatePartCommand(label, 'profiles', profileId, patch);
}

export function updatePanelCommand(label: string, panelId: string, patch: Partial<Omit<Panel, 'id'>>): EditorCommand {
  return updatePartCommand(label, 'panels', panelId, patch);
}

/** Fastener head, T-nut kind and count: joint fields with no machining consequence, so a plain field edit. */
export function updateJointCommand(label: string, jointId: string, patch: Partial<Pick<Joint, 'fastenerHead' | 'tNut' | 'quantity'>>): EditorCommand {
  return updatePartCommand(label, 'joints', jointId, patch);
}

type PartCollection = 'profiles' | 'panels' | 'joints';
type PartOf<C extends PartCollection> = DesignDocument[C][number];

function updatePartCommand<C extends PartCollection>(
  label: string,
  collection: C,
  partId: string,
  patch: Partial<Omit<PartOf<C>, 'id'>>,
): EditorCommand {
  let previousValues: Record<string, unknown> | null = null;
  const replacePart = (design: DesignDocument, change: (part: PartOf<C>) => PartOf<C>): DesignDocument => {
    const parts = design[collection] as PartOf<C>[];
    const index = parts.findIndex((part) => part.id === partId);
    if (index < 0) throw new CommandRefusedError(`There is no part "${partId}" in this design.`);
    const nextParts = parts.slice();
    nextParts[index] = change(parts[index]);
    return { ...design, [collection]: nextParts };
  };
  return {
    label,
    apply(design) {
      return replacePart(design, (part) => {
        previousValues = {};
        for (const key of Object.keys(patch)) previousValues[key] = (part as Record<string, unknown>)[key];
        return { ...part, ...patch };
      });
    },
    undo(design) {
      const restore = previousValues;
      if (!restore) return design;
      return replacePart(design, (part) => {
        const next = { ...part, ...restore } as Record<string, unknown>;
        for (const [key, value] of Object.entries(restore)) if (value === undefined) delete next[key];
        return next as PartOf<C>;
      });
    },
    toJSON() {
      return { type: 'update', collection, id: partId, patch };
    },
  };
}

/** The units the design is shown in: saved with the design, so it opens the way it was made. */
export function setDesignUnitsCommand(units: DesignDocument['units']): EditorCommand {
  let previous: DesignDocument['units'] | null = null;
  return {
    label: units === 'in' ? 'Show inches' : 'Show millimetres',
    apply(design) {
      previous = design.units;
      return { ...design, units };
    },
    undo(design) {
      return previous ? { ...design, units: previous } : design;
    },
    toJSON() {
      return { type: 'set-units', units };
    },
  };
}
