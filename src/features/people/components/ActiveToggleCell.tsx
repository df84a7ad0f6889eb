import { useState } from 'react';
import { Button, ConfirmDialog } from '@/components/ui';
import type { User } from '@/domain/contracts';
import { messageOf } from '@/lib/formErrors';
import { useUpdateUser } from '../api/updateUser';

/** Deactivate or reactivate a person, after confirmation. Owners cannot deactivate themselves. */
export function ActiveToggleCell({ user, isSelf }: { user: User; isSelf: boolean }) {
  const [confirming, setConfirming] = useState(false);
  const updateUser = useUpdateUser();
  const deactivating = user.active;
  const close = () => {
    updateUser.reset();
    setConfirming(false);
  };
  if (isSelf) return <span className="text-xs text-ink-muted">That is you</span>;
  return (
    <>
      <Button variant={deactivating ? 'ghost' : 'secondary'} onClick={() => setConfirming(true)} aria-label={`${deactivating ? 'Deactivate' : 'Reactivate'} ${user.displayName}`}>
        {deactivating ? 'Deactivate' : 'Reactivate'}
      </Button>
      <ConfirmDialog
        open={confirming}
        title={deactivating ? `Deactivate ${user.displayName}?` : `Reactivate ${user.displayName}?`}
        confirmLabel={deactivating ? 'Deactivate' : 'Reactivate'}
        tone={deactivating ? 'danger' : 'primary'}
        pending={updateUser.isPending}
        error={updateUser.error ? messageOf(updateUser.error) : null}
        onCancel={close}
        onConfirm={() => updateUser.mutate({ id: user.id, active: !user.active }, { onSuccess: close })}
      >
        <p>
          {deactivating
            ? `${user.displayName} (${user.email}) will be signed out everywhere and cannot sign in until reactivated. Their designs and comments stay.`
            : `${user.displayName} (${user.email}) will be able to sign in again with their existing password.`}
        </p>
      </ConfirmDialog>
    </>
  );
}
