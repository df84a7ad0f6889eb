import type { DesignDocument, DesignSettings, LoadCase } from '@/domain/design/schema';
import { CommandRefusedError, type EditorCommand } from '@/features/editor/commands/EditorCommand';

// Commands the outputs dock issues itself: stock settings and load cases (no domain operation covers them yet).

export type StockSettingsPatch = Partial<Pick<DesignSettings, 'stockLength' | 'kerf' | 'endTrim' | 'minReusableOffcut'>>;

/** Changes design.settings fields; undo restores exactly the fields it changed. */
export function updateSettingsCommand(label: string, patch: StockSettingsPatch): EditorCommand {
  let previous: StockSettingsPatch | null = null;
  return {
    label,
    apply(design: DesignDocument) {
      previous = {};
      for (const key of Object.keys(patch) as (keyof StockSettingsPatch)[]) previous[key] = design.settings[key];
      return { ...design, settings: { ...design.settings, ...patch } };
    },
    undo(design: DesignDocument) {
      if (!previous) return design;
      return { ...design, settings: { ...design.settings, ...previous } };
    },
    toJSON() {
      return { type: 'update-settings', label, patch };
    },
  };
}

/** Appends a load case; refuses a duplicate id so history never holds two cases with one id. */
export function addLoadCaseCommand(loadCase: LoadCase): EditorCommand {
  return {
    label: `Add load case "${loadCase.name}"`,
    apply(design: DesignDocument) {
      if (design.loadCases.some((existing) => existing.id === loadCase.id)) {
        throw new CommandRefusedError(`A load case with id "${loadCase.id}" already exists.`);
      }
      return { ...design, loadCases: [...design.loadCases, loadCase] };
    },
    undo(design: DesignDocument) {
      return { ...design, loadCases: design.loadCases.filter((existing) => existing.id !== loadCase.id) };
    },
    toJSON() {
      return { type: 'add-load-case', loadCase };
    },
  };
}

/** Removes a load case by id; undo puts it back where it was. */
export function removeLoadCaseCommand(loadCaseId: string): EditorCommand {
  let removed: { loadCase: LoadCase; index: number } | null = null;
  return {
    label: 'Remove load case',
    apply(design: DesignDocument) {
      const index = design.loadCases.findIndex((existing) => existing.id === loadCaseId);
      if (index < 0) throw new CommandRefusedError(`There is no load case "${loadCaseId}".`);
      removed = { loadCase: design.loadCases[index], index };
      return { ...design, loadCases: design.loadCases.filter((existing) => existing.id !== loadCaseId) };
    },
    undo(design: DesignDocument) {
      if (!removed) return design;
      const next = design.loadCases.slice();
      next.splice(removed.index, 0, removed.loadCase);
      return { ...design, loadCases: next };
    },
    toJSON() {
      return { type: 'remove-load-case', loadCaseId };
    },
  };
}

/** A fresh load-case id not used in the design ("load-3"). */
export function nextLoadCaseId(design: DesignDocument): string {
  const used = new Set(design.loadCases.map((loadCase) => loadCase.id));
  let n = design.loadCases.length + 1;
  while (used.has(`load-${n}`)) n += 1;
  return `load-${n}`;
}
