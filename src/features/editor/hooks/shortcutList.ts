/** The editor's keyboard shortcuts, as data: the handler and the shortcut sheet read the same list. */
export interface ShortcutEntry {
  keys: string[];
  action: string;
  group: 'History' | 'Tools' | 'Selection' | 'View' | 'File';
}

export const isMacPlatform = () => typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform);

export function editorShortcuts(mod = isMacPlatform() ? '⌘' : 'Ctrl'): ShortcutEntry[] {
  return [
    { group: 'History', keys: [`${mod}+Z`], action: 'Undo the last edit' },
    { group: 'History', keys: [`${mod}+Shift+Z`, `${mod}+Y`], action: 'Redo' },
    { group: 'File', keys: [`${mod}+S`], action: 'Save a new revision' },
    { group: 'Tools', keys: ['V'], action: 'Pick and move parts' },
    { group: 'Tools', keys: ['D'], action: 'Draw a profile' },
    { group: 'Tools', keys: ['O'], action: 'Fill an opening with a panel' },
    { group: 'Selection', keys: ['Esc'], action: 'Clear the selection (and leave a tool)' },
    { group: 'Selection', keys: ['Delete', 'Backspace'], action: 'Delete the selected parts' },
    { group: 'Selection', keys: [`${mod}+D`], action: 'Duplicate the selected parts' },
    { group: 'View', keys: ['F'], action: 'Fit everything in view (the selection, if any)' },
    { group: 'View', keys: ['1'], action: 'Look from the front' },
    { group: 'View', keys: ['2'], action: 'Look from the top' },
    { group: 'View', keys: ['3'], action: 'Look from the side' },
    { group: 'View', keys: ['4'], action: 'Angled (isometric) view' },
    { group: 'View', keys: ['?'], action: 'Show this list' },
  ];
}
