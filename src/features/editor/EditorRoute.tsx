import { useState } from 'react';
import { Link, useParams } from 'react-router';
import { ErrorNotice } from '@/components/ui';
import { EditorSkeleton } from '@/components/ui/EditorSkeleton';
import { defaultCatalogue, getSystem } from '@/domain/catalogue';
import { isApiError } from '@/lib/apiClient';
import { useEditorDesign } from './api/getEditorDesign';
import type { EditorDesignDetail } from './api/schemas';
import { EditorWorkspace } from './layout/EditorWorkspace';
import { createEditorStore, EditorStoreProvider } from './store/editorStore';
import { DEFAULT_DRAW_VARIANT_ID } from './store/viewSlice';

/** /designs/:designId — loads the latest revision and opens it in the editor (a lazy chunk: it carries the 3D code). */
export default function EditorRoute() {
  const { designId: param } = useParams();
  const designId = Number(param);
  const valid = Number.isInteger(designId) && designId > 0;
  const query = useEditorDesign(valid ? designId : 0);

  if (!valid) return <EditorProblem message="This address does not name a design." />;
  if (query.isPending) return <EditorSkeleton label="Opening the design…" />;
  if (query.isError) {
    const error = query.error;
    const message =
      isApiError(error) && error.status === 404
        ? 'This design does not exist, or it was deleted.'
        : isApiError(error)
          ? error.message
          : 'The design could not be opened.';
    return <EditorProblem message={message} onRetry={isApiError(error) && error.status === 404 ? undefined : () => void query.refetch()} />;
  }
  return <EditorSession key={designId} detail={query.data} />;
}

/** One open design: its own store, loaded once (later refetches never overwrite local edits). */
function EditorSession({ detail }: { detail: EditorDesignDetail }) {
  const [store] = useState(() => {
    const { revision, design } = detail;
    const system = getSystem(defaultCatalogue, revision.document.systemId);
    const editorStore = createEditorStore({ drawSystemVariantId: system?.defaultVariantId ?? DEFAULT_DRAW_VARIANT_ID });
    editorStore.getState().loadDesign(revision.document, {
      designId: design.id,
      revision: revision.number,
      savedAt: revision.createdAt,
      savedBy: revision.createdBy.displayName,
    });
    return editorStore;
  });
  return (
    <EditorStoreProvider store={store}>
      <EditorWorkspace />
    </EditorStoreProvider>
  );
}

function EditorProblem({ message, onRetry }: { message: string; onRetry?: () => void }) {
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-4 p-8">
      <ErrorNotice title="Cannot open this design" message={message} onRetry={onRetry} />
      <Link to="/designs" className="text-sm font-medium text-accent-strong underline underline-offset-2 focus-ring">
        Back to designs
      </Link>
    </div>
  );
}
