import type { INestApplication } from '@nestjs/common';

import { signIn } from './auth-operations.js';
import { gql } from './graphql.js';

export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? 'endgrain-demo-2026';
let ipCounter = 0;

/** Signs in a demo account from its own fake address (keeps the per-IP throttle out of the way). */
export async function demoToken(app: INestApplication, email: string): Promise<string> {
  ipCounter += 1;
  const res = await signIn(app, { email, password: DEMO_PASSWORD }, `10.66.${process.pid % 250}.${ipCounter % 250}`);
  if (!res.data) throw new Error(`demo sign-in failed for ${email}: ${JSON.stringify(res.errors)}`);
  return res.data.signIn.accessToken;
}

export type DemoClubCode = 'LARCH' | 'CFORK' | 'ALDER' | 'NBIRCH' | 'QRUN';
export type EventCode = 'underhand-chop' | 'standing-block-chop' | 'springboard' | 'single-buck' | 'double-buck' | 'mixed-double-buck' | 'axe-throw' | 'horizontal-hit';

export interface Ids {
  seasonId: string;
  clubs: Record<DemoClubCode, string>;
  eventTypes: Record<EventCode, string>;
}

export async function lookupIds(app: INestApplication): Promise<Ids> {
  const res = await gql<{ seasons: { id: string; isCurrent: boolean }[]; clubs: { id: string; shortName: string }[]; eventTypes: { id: string; code: string }[] }>(
    app,
    '{ seasons { id isCurrent } clubs { id shortName } eventTypes { id code } }',
  );
  const data = res.data!;
  return {
    seasonId: data.seasons.find((s) => s.isCurrent)!.id,
    clubs: Object.fromEntries(data.clubs.map((c) => [c.shortName, c.id])) as Ids['clubs'],
    eventTypes: Object.fromEntries(data.eventTypes.map((t) => [t.code, t.id])) as Ids['eventTypes'],
  };
}

const MEET_FIELDS = 'id name status entriesOpen events { id division eventType { code name } drawSeed heatSize entries { id clubId label drawPosition heat } }';

export function createMeet(app: INestApplication, token: string, input: Record<string, unknown>) {
  return gql<{ createMeet: { id: string; status: string } }>(app, `mutation($i: MeetInput!) { createMeet(input: $i) { ${MEET_FIELDS} } }`, { i: input }, { token });
}

export function addMeetEvent(app: INestApplication, token: string, meetId: string, input: Record<string, unknown>) {
  return gql<{ addMeetEvent: { id: string } }>(app, 'mutation($m: ID!, $i: MeetEventInput!) { addMeetEvent(meetId: $m, input: $i) { id diameterMm speciesName } }', { m: meetId, i: input }, { token });
}

export function setMeetStatus(app: INestApplication, token: string, id: string, status: string) {
  return gql<{ setMeetStatus: { status: string } }>(app, 'mutation($id: ID!, $s: MeetStatus!) { setMeetStatus(id: $id, status: $s) { status } }', { id, s: status }, { token });
}

export function meet(app: INestApplication, id: string, token?: string) {
  return gql<{ meet: { id: string; status: string; events: { id: string; drawSeed: number | null; entries: { id: string; label: string; drawPosition: number | null; heat: number | null }[] }[] } }>(
    app, `query($id: ID!) { meet(id: $id) { ${MEET_FIELDS} } }`, { id }, { token });
}

export function addAthlete(app: INestApplication, token: string, input: Record<string, unknown>) {
  return gql<{ addAthlete: { id: string; name: string } }>(app, 'mutation($i: AthleteInput!) { addAthlete(input: $i) { id name } }', { i: input }, { token });
}

export function enter(app: INestApplication, token: string, meetEventId: string, clubId: string, athleteIds: string[]) {
  return gql<{ enterMeetEvent: { id: string; label: string } }>(
    app, 'mutation($i: EnterMeetEventInput!) { enterMeetEvent(input: $i) { id label } }', { i: { meetEventId, clubId, athleteIds } }, { token });
}

export function drawOrder(app: INestApplication, token: string, meetEventId: string, heatSize: number, seed?: number) {
  return gql<{ drawOrder: { drawSeed: number; entries: { id: string; drawPosition: number; heat: number }[] } }>(
    app, 'mutation($i: DrawOrderInput!) { drawOrder(input: $i) { drawSeed entries { id drawPosition heat } } }', { i: { meetEventId, heatSize, seed } }, { token });
}

let meetCounter = 0;
/** A meet input a week out, with entries open for three days. */
export function meetInput(ids: Ids, over: Record<string, unknown> = {}): Record<string, unknown> {
  meetCounter += 1;
  const day = new Date(Date.now() + 7 * 86400_000).toISOString().slice(0, 10);
  return {
    name: `Test meet ${process.pid}-${meetCounter}-${Date.now().toString(36)}`,
    seasonId: ids.seasonId,
    hostClubId: ids.clubs.LARCH,
    startsOn: day,
    venue: 'Test landing',
    entryDeadline: new Date(Date.now() + 3 * 86400_000).toISOString(),
    divisions: ['MENS', 'WOMENS', 'MIXED'],
    scoringScheme: 'FIXED_TABLE',
    pointsTable: [7, 6, 5, 4, 3, 2, 1],
    ...over,
  };
}
