import { Outlet } from 'react-router';
import { useCurrentUser } from '@/lib/session/currentUser';
import { AppShell } from './AppShell';

/** Route element for signed-in pages (sits inside RequireRole, so the user is known). */
export function SignedInLayout({ compact = false }: { compact?: boolean }) {
  const { data: user } = useCurrentUser();
  if (!user) return null;
  return (
    <AppShell user={user} compact={compact}>
      <Outlet />
    </AppShell>
  );
}

