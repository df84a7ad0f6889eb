import type { DesignDocument } from '@/domain/design/schema';
import type { EditorCommand } from './EditorCommand';

/**
 * Replaces the whole document (a generator's "replace current design"), undoable.
 * The JSON form carries the new document, since it has no smaller description.
 */
export function replaceDesignCommand(label: string, next: DesignDocument): EditorCommand {
  let previous: DesignDocument | null = null;
  return {
    label,
    apply(design) {
      previous = design;
      return next;
    },
    undo(design) {
      return previous ?? design;
    },
    toJSON() {
      return { type: 'replace-design', label, design: next };
    },
  };
}
