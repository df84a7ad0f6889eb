import type { Blocker } from 'react-router';
import { ConfirmDialog } from '@/components/ui';

/** Answers the navigation blocker: stay (the default) or leave and drop the unsaved changes. */
export function LeaveWithoutSavingDialog({ blocker }: { blocker: Blocker }) {
  return (
    <ConfirmDialog
      open={blocker.state === 'blocked'}
      title="Leave without saving?"
      confirmLabel="Leave and lose changes"
      onConfirm={() => blocker.proceed?.()}
      onCancel={() => blocker.reset?.()}
    >
      <p>This design has changes that are not saved as a revision yet. If you leave now they are lost.</p>
    </ConfirmDialog>
  );
}
