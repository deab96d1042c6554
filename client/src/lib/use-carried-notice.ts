import { useEffect, useState } from 'react';
import { useLocation, useNavigate } from 'react-router';

/** What a page leaves for the next one to say: `navigate(to, { state: { notice } })`. */
export interface CarriedNotice {
  notice?: string;
}

/**
 * A notice carried over from the page that navigated here (after a save or a delete), shown once:
 * the address's state is cleared, so a reload does not repeat it. Returns the notice and its setter.
 */
export function useCarriedNotice(): [string | undefined, (notice: string | undefined) => void] {
  const location = useLocation();
  const navigate = useNavigate();
  const carried = (location.state as CarriedNotice | null)?.notice;
  const [notice, setNotice] = useState<string | undefined>(carried);
  useEffect(() => {
    if (carried) void navigate(`${location.pathname}${location.search}`, { replace: true, state: null });
  }, [carried, navigate, location.pathname, location.search]);
  return [notice, setNotice];
}
