/** A meet's life: built in draft, takes entries, closes them, runs, publishes. */
export const MEET_STATUSES = ['DRAFT', 'OPEN', 'CLOSED', 'RUNNING', 'PUBLISHED', 'ARCHIVED'] as const;
export type MeetStatus = (typeof MEET_STATUSES)[number];

export const MEET_STATUS_LABELS: Record<MeetStatus, string> = {
  DRAFT: 'Being built',
  OPEN: 'Taking entries',
  CLOSED: 'Entries closed',
  RUNNING: 'Under way',
  PUBLISHED: 'Results out',
  ARCHIVED: 'Archived',
};

const NEXT: Record<MeetStatus, readonly MeetStatus[]> = {
  DRAFT: ['OPEN', 'ARCHIVED'],
  OPEN: ['DRAFT', 'CLOSED', 'ARCHIVED'],
  CLOSED: ['OPEN', 'RUNNING', 'ARCHIVED'],
  RUNNING: ['CLOSED', 'PUBLISHED'],
  PUBLISHED: ['RUNNING', 'ARCHIVED'],
  ARCHIVED: [],
};

/** Null when the move is allowed, otherwise the reason it is not. */
export function meetStatusProblem(from: MeetStatus, to: MeetStatus): string | null {
  if (from === to) return `The meet is already "${MEET_STATUS_LABELS[to]}".`;
  if (NEXT[from].includes(to)) return null;
  const allowed = NEXT[from].map((s) => `"${MEET_STATUS_LABELS[s]}"`).join(' or ');
  return `A meet that is "${MEET_STATUS_LABELS[from]}" can only move to ${allowed || 'nothing else'}.`;
}

/** Public visitors see meets once they take entries; drafts stay with the organisers. */
export function isMeetPublic(status: MeetStatus): boolean {
  return status !== 'DRAFT';
}
