import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router';
import { PageSkeleton, ErrorNotice } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { useCurrentUser } from '@/lib/session/currentUser';
import type { Role } from '@/domain/contracts';
import { NotAvailablePage } from './NotAvailablePage';

export interface RequireRoleProps {
  /** Roles allowed here; omit to allow any signed-in person. */
  roles?: readonly Role[];
  /** What to show when allowed; defaults to the child route (<Outlet />). */
  children?: ReactNode;
}

/** Route guard: anonymous visitors go to /sign-in?next=…, other roles see a "not available" page. */
export function RequireRole({ roles, children }: RequireRoleProps) {
  const location = useLocation();
  const { data: user, isPending, error, refetch } = useCurrentUser();

  if (isPending) return <PageSkeleton label="Checking who is signed in" />;
  if (error) {
    return (
      <div className="p-8">
        <ErrorNotice title="Could not check your sign-in" message={messageOf(error)} onRetry={() => void refetch()} />
      </div>
    );
  }
  if (!user) {
    const next = `${location.pathname}${location.search}${location.hash}`;
    const search = next === '/' ? '' : `?next=${encodeURIComponent(next)}`;
    return <Navigate to={`/sign-in${search}`} replace />;
  }
  if (roles && !roles.includes(user.role)) return <NotAvailablePage role={user.role} />;
  return children ?? <Outlet />;
}
