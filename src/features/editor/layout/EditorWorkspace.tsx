import { useEffect, useState } from 'react';
import { useUnits } from '@/lib/session/useUnits';
import { ErrorNotice } from '@/components/ui';
import { GeneratorDialog } from '../dialogs/GeneratorDialog';
import { ShortcutSheetDialog } from '../dialogs/ShortcutSheetDialog';
import { useEditorShortcuts } from '../hooks/useEditorShortcuts';
import { useLiveAnalysis } from '../hooks/useLiveAnalysis';
import { useSelectionActions } from '../hooks/useSelectionActions';
import { LeaveWithoutSavingDialog } from '../saving/LeaveWithoutSavingDialog';
import { StaleRevisionDialog } from '../saving/StaleRevisionDialog';
import { useSaveDesign } from '../saving/useSaveDesign';
import { useUnsavedChangesGuard } from '../saving/useUnsavedChangesGuard';
import { setDesignUnitsCommand } from '../commands/patchCommands';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import type { DisplayUnits } from '../store/types';
import { CanvasArea } from './CanvasArea';
import { EditorTopBar } from './EditorTopBar';
import { InspectorColumn } from './InspectorColumn';
import { OutputsArea } from './OutputsArea';
import { RefusalNotice } from './RefusalNotice';
import { ToolStrip } from './ToolStrip';

/** The editor screen: top bar, tool strip, the model, the inspector and the outputs dock, plus its keys and dialogs. */
export function EditorWorkspace() {
  // Lengths show in the design's own units (chosen when it was made, changed with the switch).
  const { setUnits: savePreference } = useUnits();
  const store = useEditorStoreApi();
  const designUnits = useEditorStore((state) => state.design.units);
  const setStoreUnits = useEditorStore((state) => state.setUnits);
  useEffect(() => setStoreUnits(designUnits), [designUnits, setStoreUnits]);
  const setUnits = (next: DisplayUnits) => {
    if (store.getState().design.units !== next) store.getState().execute(setDesignUnitsCommand(next));
    savePreference(next);
  };

  useLiveAnalysis();
  const saveState = useSaveDesign();
  const blocker = useUnsavedChangesGuard();
  const { deleteSelection, duplicateSelection } = useSelectionActions();
  const [shortcutsOpen, setShortcutsOpen] = useState(false);
  const [generatorsOpen, setGeneratorsOpen] = useState(false);
  // Full-width outputs cover the tools, model and inspector; those are inert meanwhile (no focus, not read out).
  const [outputsFullWidth, setOutputsFullWidth] = useState(false);

  useEditorShortcuts({
    save: () => void saveState.save(),
    deleteSelection,
    duplicateSelection,
    openShortcutSheet: () => setShortcutsOpen(true),
    modelCovered: outputsFullWidth,
  });

  return (
    <div className="flex h-dvh min-h-0 flex-col md:h-full">
      <EditorTopBar saving={saveState.saving} onSave={() => void saveState.save()} onUnitsChange={setUnits} onOpenShortcuts={() => setShortcutsOpen(true)} modelCovered={outputsFullWidth} />
      {saveState.error ? (
        <div className="border-b border-paper-line bg-paper-raised px-3 py-2">
          <ErrorNotice title="Not saved" message={saveState.error} onRetry={() => void saveState.save()} />
        </div>
      ) : null}
      <div className="relative flex min-h-0 flex-1">
        <div className="contents" inert={outputsFullWidth}>
          <ToolStrip onOpenGenerators={() => setGeneratorsOpen(true)} />
        </div>
        <div className="flex min-w-0 flex-1 flex-col">
          <div className="relative flex min-h-0 flex-1 flex-col" inert={outputsFullWidth}>
            <CanvasArea />
            <RefusalNotice />
          </div>
          <OutputsArea fullWidth={outputsFullWidth} onFullWidthChange={setOutputsFullWidth} />
        </div>
        <div className="contents" inert={outputsFullWidth}>
          <InspectorColumn />
        </div>
      </div>
      <ShortcutSheetDialog open={shortcutsOpen} onClose={() => setShortcutsOpen(false)} />
      <GeneratorDialog open={generatorsOpen} onClose={() => setGeneratorsOpen(false)} />
      <StaleRevisionDialog saveState={saveState} />
      <LeaveWithoutSavingDialog blocker={blocker} />
    </div>
  );
}
