import type { SettingsChanges } from '@/domain/design/operationTypes';
import type { DesignDocument, LoadCase } from '@/domain/design/schema';
import type { EditorCommand } from '@/features/editor/commands/EditorCommand';
import { operationCommand } from '@/features/editor/commands/operationCommand';

// Commands the outputs dock issues: thin recorders of the domain's settings and load-case operations.

export type StockSettingsPatch = SettingsChanges;

/** Changes design.settings fields (the domain's `updateSettings`). */
export function updateSettingsCommand(label: string, patch: StockSettingsPatch): EditorCommand {
  return operationCommand(label, { type: 'updateSettings', payload: { changes: patch } });
}

/** Appends a load case; the domain refuses a duplicate id. */
export function addLoadCaseCommand(loadCase: LoadCase): EditorCommand {
  return operationCommand(`Add load case "${loadCase.name}"`, { type: 'addLoadCase', payload: { loadCase } });
}

/** Removes a load case by id. */
export function removeLoadCaseCommand(loadCaseId: string): EditorCommand {
  return operationCommand('Remove load case', { type: 'removeLoadCase', payload: { loadCaseId } });
}

/** A fresh load-case id not used in the design ("load-3"). */
export function nextLoadCaseId(design: DesignDocument): string {
  const used = new Set(design.loadCases.map((loadCase) => loadCase.id));
  let n = design.loadCases.length + 1;
  while (used.has(`load-${n}`)) n += 1;
  return `load-${n}`;
}
