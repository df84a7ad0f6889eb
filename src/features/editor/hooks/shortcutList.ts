/**
 * The editor's keyboard shortcuts, as data: the key handler, the tool strip's and camera buttons'
 * tooltips and the shortcut sheet all read this one list. A tool's key is the first letter of its
 * own name (Pick P, Draw D, Fill F, Measure M), so the keys follow our words, not another program's.
 */
import type { EditorTool, EditorView } from '../store/types';

export interface ShortcutEntry {
  keys: string[];
  action: string;
  group: 'History' | 'Tools' | 'Selection' | 'View' | 'File';
}

export interface ToolShortcut {
  tool: EditorTool;
  /** The tool's name on its button. */
  label: string;
  /** The key that picks it: the first letter of the label. */
  key: string;
  action: string;
}

export const TOOL_SHORTCUTS: ToolShortcut[] = [
  { tool: 'select', label: 'Pick', action: 'Pick and move parts' },
  { tool: 'draw-profile', label: 'Draw', action: 'Draw profiles, each one starting where the last ended' },
  { tool: 'fill-opening', label: 'Fill', action: 'Fill a frame opening with a panel' },
  { tool: 'measure', label: 'Measure', action: 'Measure between two points' },
].map((entry) => ({ ...entry, tool: entry.tool as EditorTool, key: entry.label.charAt(0).toUpperCase() }));

export interface ViewShortcut {
  view: EditorView;
  label: string;
  key: string;
  action: string;
}

/** Camera presets: the same names as the plan control's buttons. */
export const VIEW_SHORTCUTS: ViewShortcut[] = [
  { view: 'front', label: 'Front', key: '1', action: 'Look from the front' },
  { view: 'top', label: 'Top', key: '2', action: 'Look from above' },
  { view: 'side', label: 'Side', key: '3', action: 'Look from the right side' },
  { view: 'iso', label: '¾', key: '4', action: 'Three-quarter view from the front' },
];

/** "Show all": the whole design in view (the selection, if any); key A for All. */
export const SHOW_ALL = { label: 'Show all', key: 'A', action: 'Show the whole design in view (the selection, if any)' };

/** "Pick (P)": a button's tooltip with its key. */
export const withKey = (text: string, key: string) => `${text} (${key})`;

export const isMacPlatform = () => typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform);

export function editorShortcuts(mod = isMacPlatform() ? '⌘' : 'Ctrl'): ShortcutEntry[] {
  return [
    { group: 'History', keys: [`${mod}+Z`], action: 'Undo the last edit' },
    { group: 'History', keys: [`${mod}+Shift+Z`, `${mod}+Y`], action: 'Redo' },
    { group: 'File', keys: [`${mod}+S`], action: 'Save a new revision' },
    ...TOOL_SHORTCUTS.map((t): ShortcutEntry => ({ group: 'Tools', keys: [t.key], action: `${t.label}: ${t.action.charAt(0).toLowerCase()}${t.action.slice(1)}` })),
    { group: 'Selection', keys: ['Esc'], action: 'Clear the selection (and leave a tool or a chain of drawn profiles)' },
    { group: 'Selection', keys: ['Delete', 'Backspace'], action: 'Delete the selected parts' },
    { group: 'Selection', keys: [`${mod}+D`], action: 'Duplicate the selected parts' },
    { group: 'Selection', keys: ['Tab', '↑', '↓', 'Enter'], action: 'Parts list: move between parts and select one' },
    { group: 'View', keys: [SHOW_ALL.key], action: SHOW_ALL.action },
    ...VIEW_SHORTCUTS.map((v): ShortcutEntry => ({ group: 'View', keys: [v.key], action: v.action })),
    { group: 'View', keys: ['?'], action: 'Show this list' },
  ];
}
