import { PageFrame, PageHeader } from '@/components/ui';
import { useCurrentUser } from '@/lib/session/currentUser';
import { ROLE_LABELS } from '@/lib/session/roles';
import { ChangePasswordForm } from './ChangePasswordForm';
import { DisplayNameForm } from './DisplayNameForm';
import { UnitsPreference } from './UnitsPreference';

export default function AccountPage() {
  const { data: user } = useCurrentUser();
  if (!user) return null;
  return (
    <PageFrame>
      <PageHeader title="Account" description={`${user.displayName} · ${ROLE_LABELS[user.role]}`} />
      <div className="grid max-w-2xl gap-6">
        <DisplayNameForm user={user} />
        <UnitsPreference />
        <ChangePasswordForm />
      </div>
    </PageFrame>
  );
}
