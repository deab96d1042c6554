import { useSearchParams } from 'react-router';

import { safeReturnPath } from '../../../config/paths.js';

/** Where to go after signing in: the page that sent the visitor here, if it is one of ours. */
export function useReturnPath(): string | undefined {
  const [params] = useSearchParams();
  return safeReturnPath(params.get('returnTo'));
}
