import { isAllowed } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import type { Role } from '../api/types.js';
import { useAuth } from '../hooks/use-auth.js';

export interface RequireAuthProps {
  /** Roles allowed in; leave out to let any signed-in member in. Admins may go everywhere. */
  roles?: readonly Role[];
  children: ReactNode;
}

/**
 * Sends a signed-out visitor to sign-in (and back here afterwards). This only hides screens:
 * the server checks every request on its own.
 */
export function RequireAuth({ roles, children }: RequireAuthProps) {
  const { status, user } = useAuth();
  const location = useLocation();

  if (status === 'loading') return <PageLoading label="Checking your sign-in" />;
  if (!user) {
    return <Navigate to={paths.auth.signIn.href(location.pathname + location.search)} replace />;
  }
  if (roles && !isAllowed(user, roles)) {
    return (
      <Alert severity="info" role="alert">
        This page is for {roles.map((role) => role.toLowerCase()).join(' or ')} accounts. If you need it, ask your
        league administrator.
      </Alert>
    );
  }
  return children;
}
