import { ConfirmDialog } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { useDeleteDesign } from '../api/deleteDesign';
import type { DesignSummary } from '../api/schemas';

/** Confirms deleting a design and all its revisions; shows the server's refusal inside the dialog. */
export function DeleteDesignDialog({ design, onClose }: { design: DesignSummary | null; onClose: () => void }) {
  const deleteDesign = useDeleteDesign();
  const close = () => {
    deleteDesign.reset();
    onClose();
  };
  return (
    <ConfirmDialog
      open={design !== null}
      title="Delete this design?"
      confirmLabel="Delete design"
      pending={deleteDesign.isPending}
      error={deleteDesign.error ? messageOf(deleteDesign.error) : null}
      onCancel={close}
      onConfirm={() => design && deleteDesign.mutate(design.id, { onSuccess: close })}
    >
      <p>
        <strong className="text-ink">{design?.name}</strong> and every saved revision of it will be removed for everyone in the shop. This
        cannot be undone.
      </p>
    </ConfirmDialog>
  );
}
