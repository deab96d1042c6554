import { describe, expect, it } from '@jest/globals';

import type { Entry, MeetDetail, MeetEvent } from '../api/types.js';
import { meetActions } from './meet-actions.js';

const entry = (clubId: string): Entry => ({ id: `e-${clubId}`, meetEventId: 'ev', clubId, clubName: '', clubShortName: '', label: '', athletes: [], drawPosition: null, heat: null });

function meet(over: Partial<MeetDetail>): MeetDetail {
  // only the fields meetActions reads; the rest of a meet does not matter here
  return { status: 'OPEN', canManage: false, enterableClubIds: [], entriesOpen: true, events: [], ...over } as MeetDetail;
}

describe('meetActions', () => {
  it("lets a coach enter and withdraw only their own club's entries while entries are open", () => {
    const actions = meetActions(meet({ enterableClubIds: ['hollow-pine'] }));
    expect(actions.enter).toBe(true);
    expect(actions.withdraw(entry('hollow-pine'))).toBe(true);
    expect(actions.withdraw(entry('cedar-fork'))).toBe(false);
    expect(actions.editEvents).toBe(false);
  });

  it('closes entering and withdrawing for coaches once the deadline passes', () => {
    // server: entries are open only while status is OPEN and the deadline is ahead
    const actions = meetActions(meet({ enterableClubIds: ['hollow-pine'], entriesOpen: false }));
    expect(actions.enter).toBe(false);
    expect(actions.withdraw(entry('hollow-pine'))).toBe(false);
  });

  it('lets organisers change events until the meet is under way, and draw only once it takes entries', () => {
    const event = { entries: [entry('c')] } as unknown as MeetEvent;
    // server: events editable in DRAFT, OPEN, CLOSED; draws in OPEN, CLOSED, RUNNING
    expect(meetActions(meet({ canManage: true, status: 'DRAFT' })).editEvents).toBe(true);
    expect(meetActions(meet({ canManage: true, status: 'DRAFT' })).draw(event)).toBe(false);
    expect(meetActions(meet({ canManage: true, status: 'RUNNING' })).editEvents).toBe(false);
    expect(meetActions(meet({ canManage: true, status: 'RUNNING' })).draw(event)).toBe(true);
    expect(meetActions(meet({ canManage: true, status: 'CLOSED' })).draw({ entries: [] } as unknown as MeetEvent)).toBe(false);
  });

  it('never offers withdrawing or deleting once results are being recorded', () => {
    const actions = meetActions(meet({ canManage: true, status: 'PUBLISHED', entriesOpen: false }));
    expect(actions.withdraw(entry('c'))).toBe(false);
    expect(actions.deleteMeet).toBe(false);
  });
});
