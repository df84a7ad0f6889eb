import { useCallback, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { isApiError } from '@/lib/apiClient';
import { editorDesignQueryOptions } from '../api/getEditorDesign';
import { useSaveDesignRevision } from '../api/saveDesignRevision';
import { useEditorStoreApi } from '../store/editorStore';
import { captureThumbnail } from './captureThumbnail';
import { downloadJson, fileSafeName } from './downloadJson';

export interface SaveConflict {
  latestRevision: number | undefined;
}

export interface SaveDesignState {
  save(): Promise<void>;
  saving: boolean;
  error: string | null;
  dismissError(): void;
  conflict: SaveConflict | null;
  /** Keeps the local design as a JSON download, then loads the server's latest revision. */
  loadTheirs(): Promise<void>;
  /** Closes the conflict; the next save asks again. */
  keepEditing(): void;
  /** Saves the local design as a new revision on top of theirs (theirs stays in the history). */
  saveOnTop(): Promise<void>;
  resolving: boolean;
}

/** Save = a new revision based on the one the edits started from; a stale base opens the conflict dialog. */
export function useSaveDesign(): SaveDesignState {
  const store = useEditorStoreApi();
  const queryClient = useQueryClient();
  const { mutateAsync } = useSaveDesignRevision();
  const [saving, setSaving] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [conflict, setConflict] = useState<SaveConflict | null>(null);
  const [resolving, setResolving] = useState(false);
  const inFlight = useRef(false);

  const saveAgainst = useCallback(
    async (baseRevision: number) => {
      const { designId, design } = store.getState();
      if (designId === null || inFlight.current) return;
      inFlight.current = true;
      setSaving(true);
      setError(null);
      try {
        const thumbnail = await captureThumbnail();
        const revision = await mutateAsync({ designId, baseRevision, document: design, thumbnail });
        store.getState().markSaved({ revision: revision.number, at: revision.createdAt, by: revision.createdBy.displayName, design });
        setConflict(null);
      } catch (failure) {
        if (isApiError(failure) && failure.code === 'stale_revision') setConflict({ latestRevision: failure.latestRevision });
        else setError(isApiError(failure) ? failure.message : 'The design could not be saved. Your changes are still here; try again.');
      } finally {
        inFlight.current = false;
        setSaving(false);
      }
    },
    [mutateAsync, store],
  );

  const save = useCallback(() => saveAgainst(store.getState().baseRevision), [saveAgainst, store]);

  const loadTheirs = useCallback(async () => {
    const { designId, design } = store.getState();
    if (designId === null) return;
    setResolving(true);
    try {
      downloadJson(`${fileSafeName(design.name)}-my-changes.json`, design);
      const latest = await queryClient.fetchQuery({ ...editorDesignQueryOptions(designId), staleTime: 0 });
      store.getState().loadDesign(latest.revision.document, {
        designId,
        revision: latest.revision.number,
        savedAt: latest.revision.createdAt,
        savedBy: latest.revision.createdBy.displayName,
      });
      setConflict(null);
    } catch (failure) {
      setError(isApiError(failure) ? failure.message : 'Their revision could not be loaded. Your design is unchanged.');
    } finally {
      setResolving(false);
    }
  }, [queryClient, store]);

  const saveOnTop = useCallback(async () => {
    if (!conflict?.latestRevision) return;
    await saveAgainst(conflict.latestRevision);
  }, [conflict, saveAgainst]);

  return {
    save,
    saving,
    error,
    dismissError: () => setError(null),
    conflict,
    loadTheirs,
    keepEditing: () => setConflict(null),
    saveOnTop,
    resolving,
  };
}
