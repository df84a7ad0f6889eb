import type { DesignDocument } from '@/domain/design/schema';
import type { EditorCommand } from './EditorCommand';
import { operationCommand } from './operationCommand';

/**
 * Replaces the whole document (a generator's "replace current design"), undoable: the domain's
 * `replaceDesign` operation, whose JSON carries the new document (it has no smaller description).
 */
export function replaceDesignCommand(label: string, next: DesignDocument): EditorCommand {
  return operationCommand(label, { type: 'replaceDesign', payload: { design: next } });
}
