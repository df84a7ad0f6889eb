import { Navigate } from 'react-router';
import { useCurrentUser } from '@/lib/session/currentUser';
import { homePathFor } from '@/lib/session/roles';

/** "/" sends each role to its own start page. */
export function HomeRedirect() {
  const { data: user } = useCurrentUser();
  return <Navigate to={user ? homePathFor(user.role) : '/sign-in'} replace />;
}
