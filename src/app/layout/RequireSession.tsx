import { Navigate, Outlet, useLocation } from 'react-router';
import { useMe } from '../../features/me/api/get-me';
import { signInPath } from '../../lib/safe-next';

/**
 * The loader already checked the session before the first render; this catches a session that ends
 * later (any 401 marks the person signed out in the cache).
 */
export function RequireSession() {
  const me = useMe();
  const location = useLocation();
  if (me.data === null) return <Navigate to={signInPath(location.pathname + location.search)} replace />;
  return <Outlet />;
}
