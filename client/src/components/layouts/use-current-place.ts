import { useLocation } from 'react-router';

import { places, type Place } from '../../config/places.js';

/** The top-level place the current address sits under, if any. */
export function useCurrentPlace(): Place | undefined {
  const { pathname } = useLocation();
  return places.find((place) => pathname === place.href || pathname.startsWith(`${place.href}/`));
}
