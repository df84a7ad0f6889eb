import { applyDesignOperation } from '@/domain/design/applyDesignOperation';
import type { DesignOperation } from '@/domain/design/operations';
import type { DesignDocument } from '@/domain/design/schema';
import type { EditorCommand } from './EditorCommand';

/**
 * A domain operation as an editor command. The operation already names parts by id, so its JSON
 * form is the operation itself. The store undoes by snapshot; `undo` here returns the document
 * the command last applied to, which is exact when commands are undone in reverse order (groups).
 */
export function operationCommand(label: string, op: DesignOperation): EditorCommand {
  let before: DesignDocument | null = null;
  return {
    label,
    apply(design) {
      before = design;
      return applyDesignOperation(design, op);
    },
    undo(design) {
      return before ?? design;
    },
    toJSON() {
      return { type: 'operation', label, operation: op };
    },
  };
}
