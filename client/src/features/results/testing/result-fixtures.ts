// Invented results for the results feature's component tests.
import type { MeetEventResults, MeetResults, Result, WaitingEntry } from '../api/types.js';

export function testResult(over: Partial<Result> = {}): Result {
  return {
    __typename: 'Result', id: 'r-1', entryId: 'e-1', meetEventId: 'ev-1', meetId: 'meet-1', meetName: 'Hollow Pine Fall Chop', meetDate: '2026-10-17',
    eventTypeId: 'type-uh', eventName: 'Underhand chop', resultKind: 'TIMED', division: 'MENS', clubId: 'club-hollow', clubName: 'Hollow Pine Woodsmen',
    clubShortName: 'HPINE', athletes: [{ __typename: 'EntryAthlete', id: 'a-1', name: 'Ansel Birchfield' }], label: 'Ansel Birchfield',
    status: 'FINISHED', postedStatus: 'FINISHED', reason: null, rawTimes: [4137], timeHundredths: 4137, penaltyHundredths: 0, totalHundredths: 4137,
    score: null, place: 1, tied: false, points: 7, countsForClub: true, provisional: false, runOffRank: null, axeId: null, axeLabel: null,
    grind: 'CONVEX', bevelIncludedDeg: 32, chiselWidthMm: 6.35, speciesId: 'eastern-white-pine', speciesName: 'Eastern white pine',
    diameterMm: 304.8, condition: 'SEASONED', ...over,
  };
}

export function testWaiting(id: string, label: string, over: Partial<WaitingEntry> = {}): WaitingEntry {
  return { __typename: 'Entry', id, clubId: 'club-tamarack', clubName: 'Tamarack Ridge Axe Club', clubShortName: 'TRIDGE', label, drawPosition: null, heat: null, ...over };
}

export function testEventResults(over: Partial<MeetEventResults> = {}): MeetEventResults {
  return {
    __typename: 'MeetEventResults', meetEventId: 'ev-1', meetId: 'meet-1', eventTypeId: 'type-uh', eventName: 'Underhand chop', resultKind: 'TIMED',
    division: 'MENS', usesHead: true, speciesId: 'eastern-white-pine', speciesName: 'Eastern white pine', diameterMm: 304.8, timeLimitHundredths: null,
    weight: 1, provisional: false, results: [testResult()], waiting: [testWaiting('e-2', 'Orla Pinecrest'), testWaiting('e-3', 'Tam Quillan')], ...over,
  };
}

export function testMeetResults(over: Partial<MeetResults> = {}): MeetResults {
  return {
    __typename: 'MeetResults', meetId: 'meet-1', meetName: 'Hollow Pine Fall Chop', startsOn: '2026-10-17', venue: 'Hollow Pine landing',
    seasonId: 'season-1', seasonName: '2026–27', status: 'RUNNING', published: false, canRecord: true, canPublish: true, asTimekeeper: false, events: [testEventResults()], ...over,
  };
}
