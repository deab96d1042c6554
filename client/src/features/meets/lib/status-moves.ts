import { MEET_STATUS_LABELS, MEET_STATUSES, meetStatusProblem, type MeetStatus } from '@endgrain/shared';

export interface StatusMove {
  to: MeetStatus;
  /** The button's words. */
  action: string;
  /** What the confirm dialog says will happen. */
  consequence: string;
}

// Keyed by the target status, with a few worded by where the meet comes from.
function describe(from: MeetStatus, to: MeetStatus): Omit<StatusMove, 'to'> {
  switch (to) {
    case 'OPEN':
      return from === 'CLOSED'
        ? { action: 'Reopen entries', consequence: 'Coaches can enter and withdraw athletes again until the entry deadline.' }
        : { action: 'Open for entries', consequence: 'The meet becomes public and coaches can enter athletes until the entry deadline.' };
    case 'DRAFT':
      return { action: 'Back to building', consequence: 'The meet is hidden from the public again and stops taking entries. Entries made so far are kept.' };
    case 'CLOSED':
      return from === 'RUNNING'
        ? { action: 'Stop the meet', consequence: 'The meet goes back to "entries closed"; nothing recorded is lost.' }
        : { action: 'Close entries', consequence: 'Coaches can no longer enter or withdraw athletes. You can then draw the order of competition.' };
    case 'RUNNING':
      return from === 'PUBLISHED'
        ? { action: 'Take results back', consequence: 'The published results are withdrawn for correction; the meet is under way again.' }
        : { action: 'Start the meet', consequence: 'The meet is under way: events can no longer be added or removed, and entries can only be scratched.' };
    case 'PUBLISHED':
      return { action: 'Publish results', consequence: 'Results become final and count towards the season standings.' };
    case 'ARCHIVED':
      return { action: 'Archive', consequence: 'The meet is kept for the record but can no longer be changed. This cannot be undone.' };
  }
}

/** The moves the shared status rules allow from here, in the order a meet normally goes. */
export function statusMoves(from: MeetStatus): StatusMove[] {
  return MEET_STATUSES.filter((to) => meetStatusProblem(from, to) === null).map((to) => ({ to, ...describe(from, to) }));
}

export { MEET_STATUS_LABELS };
