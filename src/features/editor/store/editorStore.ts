// The editor store's public entry: the React-free core plus its thin React binding.
export { createEditorStore, placeholderDesign } from './createEditorStore';
export { EditorStoreProvider, useEditorHistory, useEditorStore, useEditorStoreApi } from './EditorStoreProvider';
export { selectablePartIds } from './partIds';
export type {
  AnalysisStatus,
  CommandRefusal,
  DisplayUnits,
  EditorState,
  EditorStoreApi,
  EditorTool,
  EditorView,
  HistorySnapshot,
  LoadMeta,
  SavedMeta,
  SelectionMode,
} from './types';
export type { EditorCommand } from '../commands/EditorCommand';
