import { useEffect } from 'react';
import { useBlocker, type Blocker } from 'react-router';
import { useEditorStore } from '../store/editorStore';

/**
 * Warns before unsaved changes are lost: the browser's own prompt on reload or close, and a
 * blocker for in-app navigation that the caller answers with a dialog.
 */
export function useUnsavedChangesGuard(): Blocker {
  const dirty = useEditorStore((state) => state.dirty);

  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers need returnValue set to show the prompt.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [dirty]);

  return useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
}
