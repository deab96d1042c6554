import type { INestApplication } from '@nestjs/common';
import request from 'supertest';

import { gql } from './graphql.js';
import { addAthlete, addMeetEvent, createMeet, demoToken, enter, meetInput, setMeetStatus, type Ids } from './meet-operations.js';

export interface ResultShape {
  id: string;
  entryId: string;
  label: string;
  clubId: string;
  status: string;
  rawTimes: number[];
  timeHundredths: number | null;
  totalHundredths: number | null;
  score: number | null;
  place: number | null;
  tied: boolean;
  points: number;
  grind: string | null;
  axeLabel: string | null;
  bevelIncludedDeg: number | null;
  chiselWidthMm: number | null;
  speciesId: string | null;
  diameterMm: number | null;
  condition: string | null;
}

export interface EventResultsShape {
  meetEventId: string;
  eventName: string;
  results: ResultShape[];
  waiting: { id: string; label: string }[];
}

const RESULT = 'id entryId label clubId status rawTimes timeHundredths totalHundredths score place tied points grind axeLabel bevelIncludedDeg chiselWidthMm speciesId diameterMm condition';
const EVENT = `meetEventId eventName results { ${RESULT} } waiting { id label }`;
const STANDING = 'division provisional clubs { clubId clubShortName points place tied placeCounts meets }';

export function recordResult(app: INestApplication, token: string | undefined, input: Record<string, unknown>) {
  return gql<{ recordResult: EventResultsShape }>(app, `mutation($i: RecordResultInput!) { recordResult(input: $i) { ${EVENT} } }`, { i: input }, { token });
}

export function correctResult(app: INestApplication, token: string | undefined, input: Record<string, unknown>) {
  return gql<{ correctResult: EventResultsShape }>(app, `mutation($i: CorrectResultInput!) { correctResult(input: $i) { ${EVENT} } }`, { i: input }, { token });
}

export function publishMeetResults(app: INestApplication, token: string | undefined, meetId: string) {
  return gql<{ publishMeetResults: { coachesMailed: number; meet: { status: string; published: boolean } } }>(
    app, 'mutation($m: ID!) { publishMeetResults(meetId: $m) { coachesMailed meet { status published } } }', { m: meetId }, { token });
}

export function meetResults(app: INestApplication, meetId: string, token?: string) {
  return gql<{ meetResults: { status: string; published: boolean; canRecord: boolean; events: EventResultsShape[] } }>(
    app, `query($m: ID!) { meetResults(meetId: $m) { status published canRecord events { ${EVENT} } } }`, { m: meetId }, { token });
}

export function meetStandings(app: INestApplication, meetId: string, token?: string) {
  return gql<{ meetStandings: { tieBreak: string; published: boolean; divisions: { division: string; clubs: { clubId: string; points: number; place: number; placeCounts: number[] }[] }[]; eventWinners: { label: string; place: number }[] } }>(
    app, `query($m: ID!) { meetStandings(meetId: $m) { tieBreak published divisions { ${STANDING} } eventWinners { label place } } }`, { m: meetId }, { token });
}

export function seasonStandings(app: INestApplication, seasonId: string, division?: string) {
  return gql<{ standings: { tieBreak: string; meets: { id: string }[]; divisions: { division: string; clubs: { clubId: string; points: number; place: number; meets: number }[] }[] } }>(
    app, `query($s: ID!, $d: Division) { standings(seasonId: $s, division: $d) { tieBreak meets { id } divisions { ${STANDING} } } }`, { s: seasonId, d: division });
}

export function explore(app: INestApplication, filter: Record<string, unknown>, sort?: Record<string, unknown>, page?: Record<string, unknown>) {
  return gql<{ results: { total: number; capped: boolean; page: number; pageSize: number; rows: ResultShape[] } }>(
    app, `query($f: ResultsFilter, $s: ResultsSort, $p: PageInput) { results(filter: $f, sort: $s, page: $p) { total capped page pageSize rows { ${RESULT} } } }`, { f: filter, s: sort, p: page });
}

export function records(app: INestApplication, filter: Record<string, unknown>) {
  return gql<{ records: { eventName: string; speciesId: string | null; diameterMm: number | null; result: { label: string; totalHundredths: number; meetName: string; meetDate: string } }[] }>(
    app, 'query($f: RecordsFilter) { records(filter: $f) { eventName speciesId diameterMm result { label totalHundredths meetName meetDate } } }', { f: filter });
}

export function athleteResults(app: INestApplication, athleteId: string) {
  return gql<{ athleteResults: { name: string; personalBests: { eventName: string; diameterMm: number | null; result: { totalHundredths: number } }[]; results: { meetId: string; place: number }[] } }>(
    app, 'query($a: ID!) { athleteResults(athleteId: $a) { name personalBests { eventName diameterMm result { totalHundredths } } results { meetId place } } }', { a: athleteId });
}

export function axeResults(app: INestApplication, axeId: string, token?: string) {
  return gql<{ axeResults: (ResultShape & { meetId: string })[] }>(app, `query($a: ID!) { axeResults(axeId: $a) { meetId ${RESULT} } }`, { a: axeId }, { token });
}

export function updateMeet(app: INestApplication, token: string, id: string, input: Record<string, unknown>) {
  return gql<{ updateMeet: { id: string } }>(app, 'mutation($id: ID!, $i: MeetInput!) { updateMeet(id: $id, input: $i) { id } }', { id, i: input }, { token });
}

export function meetChanges(app: INestApplication, token: string, meetId: string) {
  return gql<{ meetChanges: { summary: string; byName: string | null; before: string; after: string }[] }>(
    app, 'query($m: ID!) { meetChanges(meetId: $m) { summary byName before after } }', { m: meetId }, { token });
}

export function resultAudit(app: INestApplication, token: string | undefined, meetId: string) {
  return gql<{ resultAudit: { action: string; reason: string | null; byName: string | null; before: string | null; after: string }[] }>(
    app, 'query($m: ID!) { resultAudit(meetId: $m) { action reason byName before after } }', { m: meetId }, { token });
}

/** POSTs a sheet to the import route as a script would (multipart field "file"). */
export function importSheet(app: INestApplication, token: string | undefined, meetId: string, csv: string, options: { dryRun?: boolean; filename?: string; type?: string } = {}) {
  let req = request(app.getHttpServer()).post(`/api/meets/${meetId}/results/import${options.dryRun ? '?dryRun=true' : ''}`);
  if (token) req = req.set('authorization', `Bearer ${token}`);
  return req.attach('file', Buffer.from(csv, 'utf8'), { filename: options.filename ?? 'results.csv', contentType: options.type ?? 'text/csv' });
}

let counter = 0;
const unique = (): string => `${process.pid.toString(36)}${Date.now().toString(36)}${(++counter).toString(36)}`;

export interface ResultsMeet {
  meetId: string;
  name: string;
  chopId: string;
  /** Three Larchmere men and two Cedar Fork men, entered in the men's underhand chop. */
  athletes: { id: string; name: string; clubId: string; entryId: string }[];
}

/** A meet with a men's underhand chop and five entries from two clubs, entries closed. */
export async function resultsMeet(
  app: INestApplication, ids: Ids, tokens: { organiser: string; coach: string; otherCoach: string }, over: Record<string, unknown> = {}, diameterMm = 304.8,
): Promise<ResultsMeet> {
  const input = meetInput(ids, over);
  const created = await createMeet(app, tokens.organiser, input);
  const meetId = created.data!.createMeet.id;
  const chop = await addMeetEvent(app, tokens.organiser, meetId, { eventTypeId: ids.eventTypes['underhand-chop'], division: 'MENS', speciesId: 'eastern-white-pine', diameterMm });
  const chopId = chop.data!.addMeetEvent.id;
  await setMeetStatus(app, tokens.organiser, meetId, 'OPEN');
  const athletes: ResultsMeet['athletes'] = [];
  for (const [clubId, token, count] of [[ids.clubs.LARCH, tokens.coach, 3], [ids.clubs.CFORK, tokens.otherCoach, 2]] as const) {
    for (let i = 0; i < count; i += 1) {
      const added = await addAthlete(app, token, { clubId, firstName: 'Res', lastName: `T${unique()}`, divisions: ['MENS'], experience: 'EXPERIENCED' });
      const athlete = added.data!.addAthlete;
      const entry = await enter(app, token, chopId, clubId, [athlete.id]);
      athletes.push({ id: athlete.id, name: athlete.name, clubId, entryId: entry.data!.enterMeetEvent.id });
    }
  }
  await setMeetStatus(app, tokens.organiser, meetId, 'CLOSED');
  return { meetId, name: String(input['name']), chopId, athletes };
}

export interface ResultsActors {
  organiser: string;
  coach: string;
  otherCoach: string;
  athlete: string;
}

/** Tokens of the demo organiser, both demo coaches (Larchmere, Cedar Fork) and the demo athlete. */
export async function resultsActors(app: INestApplication): Promise<ResultsActors> {
  const [organiser, coach, otherCoach, athlete] = await Promise.all(
    ['organiser@example.org', 'coach@example.org', 'coach.cedarfork@example.org', 'athlete@example.org'].map((email) => demoToken(app, email)),
  );
  return { organiser: organiser!, coach: coach!, otherCoach: otherCoach!, athlete: athlete! };
}
