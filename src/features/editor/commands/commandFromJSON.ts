import type { DesignOperation } from '@/domain/design/operations';
import type { EditorCommand } from './EditorCommand';
import { groupCommand } from './groupCommand';
import { operationCommand } from './operationCommand';

/** A command's JSON form: a recorded domain operation, or a group of them. */
export type CommandJSON =
  | { type: 'operation'; label: string; operation: DesignOperation }
  | { type: 'group'; label: string; commands: CommandJSON[] };

/**
 * Rebuilds a command from its JSON form (as `toJSON` wrote it, possibly after a JSON round trip).
 * Every editor edit records a domain operation, so a saved history replays onto the document.
 */
export function commandFromJSON(json: unknown): EditorCommand {
  const value = json as Partial<CommandJSON> | null;
  if (value?.type === 'operation' && value.operation && typeof value.operation === 'object') {
    return operationCommand(String(value.label ?? ''), value.operation);
  }
  if (value?.type === 'group' && Array.isArray(value.commands)) {
    return groupCommand(String(value.label ?? ''), value.commands.map(commandFromJSON));
  }
  throw new Error(`Not a recorded command: ${JSON.stringify(json)?.slice(0, 80)}`);
}
