import type { Entry, MeetDetail, MeetEvent } from '../api/types.js';

// What the meet page offers, mirroring the server's status rules (server/src/meets/*.service.ts).
// Only to hide buttons: the server checks every request on its own.
const EVENTS_EDITABLE = ['DRAFT', 'OPEN', 'CLOSED'];
const DRAWABLE = ['OPEN', 'CLOSED', 'RUNNING'];
const UNDER_WAY = ['RUNNING', 'PUBLISHED'];

export interface MeetActions {
  editEvents: boolean;
  deleteMeet: boolean;
  draw: (event: MeetEvent) => boolean;
  enter: boolean;
  withdraw: (entry: Entry) => boolean;
}

export function meetActions(meet: MeetDetail): MeetActions {
  const organiser = meet.canManage;
  const coachOf = (clubId: string) => meet.enterableClubIds.includes(clubId);
  return {
    editEvents: organiser && EVENTS_EDITABLE.includes(meet.status),
    deleteMeet: organiser && !UNDER_WAY.includes(meet.status),
    draw: (event) => organiser && DRAWABLE.includes(meet.status) && event.entries.length > 0,
    // Organisers may enter after the deadline for a club they coach; coaches only while entries are open.
    enter: meet.enterableClubIds.length > 0 && (meet.entriesOpen || (organiser && meet.status !== 'DRAFT' && !UNDER_WAY.includes(meet.status))),
    withdraw: (entry) =>
      !UNDER_WAY.includes(meet.status) && (organiser || (coachOf(entry.clubId) && meet.entriesOpen)),
  };
}
