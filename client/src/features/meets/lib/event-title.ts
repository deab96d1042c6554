import { DIVISION_LABELS } from '@endgrain/shared';

import type { MeetEvent } from '../api/types.js';

/** "Underhand chop · Men's": how an event is named on every screen and button. */
export function eventTitle(event: Pick<MeetEvent, 'eventType' | 'division'>): string {
  return `${event.eventType.name} · ${DIVISION_LABELS[event.division]}`;
}
