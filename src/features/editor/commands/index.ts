export { CommandRefusedError, type EditorCommand } from './EditorCommand';
export { commandFromJSON, type CommandJSON } from './commandFromJSON';
export { groupCommand } from './groupCommand';
export { operationCommand } from './operationCommand';
export { replaceDesignCommand } from './replaceDesignCommand';
export { updateJointCommand, updatePanelCommand, updateProfileCommand } from './patchCommands';
