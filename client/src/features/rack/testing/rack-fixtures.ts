import type { Axe, Lineup, LineupEntry, Rack } from '../api/types.js';

/** An invented axe: a 15° included chisel grind with a ¾ in (19.05 mm) chisel. */
export function testAxe(overrides: Partial<Axe> = {}): Axe {
  return {
    __typename: 'Axe',
    id: 'axe-race-3',
    clubId: 'club-1',
    clubName: 'Hollow Pine Woodsmen',
    label: 'Race 3',
    maker: 'Hollowbrook Forge',
    headWeightG: 2495,
    bitWidthMm: 133.35,
    grind: 'CHISEL',
    geometry: { __typename: 'HeadGeometry', includedAngleDeg: 15, perSideAngleDeg: 7.5, chiselWidthMm: 19.05, shoulderThicknessMm: 5.016 } as Axe['geometry'],
    handleLengthMm: 762,
    handleWood: 'hickory',
    hangChecked: true,
    pinned: true,
    status: 'READY',
    allowedFor: 'ANYONE',
    isPublic: false,
    notes: '',
    lastServicedOn: '2026-11-15',
    photoCount: 0,
    ...overrides,
  };
}

export function testRack(axes: Axe[], overrides: Partial<Rack> = {}): Rack & { __typename: 'Rack' } {
  return { __typename: 'Rack', clubId: 'club-1', clubName: 'Hollow Pine Woodsmen', canManage: true, isMember: true, axes, ...overrides };
}

export function testEntry(overrides: Partial<LineupEntry> = {}): LineupEntry {
  return {
    __typename: 'LineupEntry',
    entryId: 'entry-1',
    meetEventId: 'event-1',
    eventName: 'Underhand chop',
    division: 'MENS',
    heat: 1,
    usesHead: true,
    athletes: [{ __typename: 'LineupAthlete', id: 'ath-tamsin', name: 'Tamsin Reedy', experience: 'ROOKIE' }],
    assignment: null,
    warnings: [],
    ...overrides,
  } as LineupEntry;
}

export function testLineup(entries: LineupEntry[], overrides: Partial<Lineup> = {}): Lineup {
  return {
    __typename: 'Lineup',
    meetId: 'meet-1',
    meetName: 'Thaw Chop',
    meetDate: '2027-03-06',
    venue: 'Sugar bush landing',
    clubId: 'club-1',
    clubName: 'Hollow Pine Woodsmen',
    canManage: true,
    entries,
    ...overrides,
  } as Lineup;
}
