import type { DesignDocument } from '@/domain/design/schema';
import type { EditorCommand } from './EditorCommand';

/**
 * Several commands as one history entry: applied in order, undone in reverse order.
 * `undo` is present only when every member can undo itself.
 */
export function groupCommand(label: string, commands: EditorCommand[]): EditorCommand {
  const members = [...commands];
  const canUndo = members.every((command) => typeof command.undo === 'function');
  const group: EditorCommand = {
    label,
    apply(design: DesignDocument) {
      return members.reduce((current, command) => command.apply(current), design);
    },
    toJSON() {
      return { type: 'group', label, commands: members.map((command) => command.toJSON()) };
    },
  };
  if (canUndo) {
    group.undo = (design: DesignDocument) =>
      members.reduceRight((current, command) => command.undo!(current), design);
  }
  return group;
}
