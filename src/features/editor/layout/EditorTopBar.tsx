import { Keyboard } from 'lucide-react';
import { SaveButton } from '../saving/SaveButton';
import { SaveStatus } from '../saving/SaveStatus';
import { useEditorStore } from '../store/editorStore';
import type { DisplayUnits } from '../store/types';
import { HistoryButtons } from './HistoryButtons';
import { ToolbarButton } from './ToolbarButton';
import { UnitsSwitch } from './UnitsSwitch';
import { ViewButtons } from './ViewButtons';

export interface EditorTopBarProps {
  saving: boolean;
  onSave: () => void;
  onUnitsChange: (units: DisplayUnits) => void;
  onOpenShortcuts: () => void;
  /** True while the full-width outputs cover the model: the camera buttons are off. */
  modelCovered?: boolean;
}

/** One slim line: what is open and whether it is saved, history, camera, units, keys and save. */
export function EditorTopBar({ saving, onSave, onUnitsChange, onOpenShortcuts, modelCovered = false }: EditorTopBarProps) {
  const name = useEditorStore((state) => state.design.name);
  const units = useEditorStore((state) => state.units);
  return (
    <header className="flex min-h-14 shrink-0 items-center gap-3 border-b border-paper-line bg-paper-raised px-3">
      <div className="flex min-w-0 flex-1 flex-col justify-center">
        <h1 className="min-w-[8rem] truncate text-base font-semibold leading-tight text-ink" title={name}>
          {name}
        </h1>
        <SaveStatus saving={saving} />
      </div>
      <HistoryButtons />
      <div className="h-7 border-l border-paper-line" aria-hidden />
      <ViewButtons covered={modelCovered} />
      <div className="h-7 border-l border-paper-line" aria-hidden />
      <UnitsSwitch units={units} onChange={onUnitsChange} />
      <ToolbarButton icon={<Keyboard aria-hidden className="size-5" />} label="Keys" title="Editor keys (?)" onClick={onOpenShortcuts} />
      <SaveButton saving={saving} onSave={onSave} />
    </header>
  );
}
