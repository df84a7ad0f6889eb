import { Navigate } from 'react-router';
import { useCurrentUser } from '@/features/auth/api/getCurrentUser';
import { homePathFor } from '@/features/auth/roles';

/** "/" sends each role to its own start page. */
export function HomeRedirect() {
  const { data: user } = useCurrentUser();
  return <Navigate to={user ? homePathFor(user.role) : '/sign-in'} replace />;
}
