import { useState } from 'react';
import { UserPlus } from 'lucide-react';
import { Button, ErrorNotice, PageFrame, PageHeader, Skeleton } from '@/components/ui';
import { useCurrentUser } from '@/lib/session/currentUser';
import { messageOf } from '@/lib/formErrors';
import { useUsers } from '../api/listUsers';
import { CreateUserDialog } from './CreateUserDialog';
import { UsersTable } from './UsersTable';

export default function PeoplePage() {
  const { data: me } = useCurrentUser();
  const users = useUsers();
  const [creating, setCreating] = useState(false);
  return (
    <PageFrame>
      <PageHeader
        title="People"
        description="Who can sign in to your shop, and what each role may do."
        actions={
          <Button variant="primary" icon={<UserPlus aria-hidden className="size-4" />} onClick={() => setCreating(true)}>
            Add person
          </Button>
        }
      />
      {users.isPending ? (
        <div role="status" className="flex flex-col gap-2">
          <span className="sr-only">Loading people…</span>
          {[0, 1, 2, 3, 4].map((key) => (
            <Skeleton key={key} className="h-14" />
          ))}
        </div>
      ) : users.error ? (
        <ErrorNotice title="People could not be loaded" message={messageOf(users.error)} onRetry={() => void users.refetch()} />
      ) : (
        <UsersTable users={users.data} currentUserId={me?.id ?? -1} />
      )}
      <CreateUserDialog open={creating} onClose={() => setCreating(false)} />
    </PageFrame>
  );
}
