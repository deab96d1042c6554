import { randomUUID } from 'node:crypto';

import type { INestApplication } from '@nestjs/common';
import type { RaceResult } from '@endgrain/shared';
import { DataSource } from 'typeorm';

import { writeHistory } from '../../src/insights/history-writer.js';
import { gql } from './graphql.js';

const CELL = 'key speciesId grind condition results athletes medianHundredths lowHundredths highHundredths q1Hundredths q3Hundredths effect effectLow effectHigh effectResults effectAthletes clearDifference label';

export interface CellShape {
  key: string; speciesId: string; grind: string; condition: string | null; results: number; athletes: number;
  medianHundredths: number; lowHundredths: number; highHundredths: number; q1Hundredths: number; q3Hundredths: number;
  effect: number | null; effectLow: number | null; effectHigh: number | null; effectResults: number; effectAthletes: number;
  clearDifference: boolean; label: string;
}

export function grainMap(app: INestApplication, token: string | undefined, filter: Record<string, unknown>) {
  return gql<{ grainMap: { totalResults: number; grinds: string[]; cells: CellShape[]; species: { speciesId: string; sentence: string; results: number }[]; comparisons: { speciesId: string; grindA: string; grindB: string; pTwoSided: number; pAdjusted: number }[]; settings: { exponent: number; exponentSource: string; exponentResults: number; resamples: number } } }>(
    app,
    `query($f: GrainMapFilter!) { grainMap(filter: $f) { totalResults grinds cells { ${CELL} } species { speciesId sentence results } comparisons { speciesId grindA grindB pTwoSided pAdjusted } settings { exponent exponentSource exponentResults resamples } } }`,
    { f: filter },
    { token },
  );
}

export function grainCell(app: INestApplication, token: string | undefined, filter: Record<string, unknown>, species: string, grind: string) {
  return gql<{ grainCell: { cells: CellShape[]; rows: { resultId: string; athleteName: string; hundredths: number; normalisedHundredths: number; ratio: number | null }[] } }>(
    app,
    `query($f: GrainMapFilter!, $s: String!, $g: String!) { grainCell(filter: $f, species: $s, grind: $g) { cells { ${CELL} } rows { resultId athleteName hundredths normalisedHundredths ratio } } }`,
    { f: filter, s: species, g: grind },
    { token },
  );
}

export function handicapSheet(app: INestApplication, token: string | undefined, meetEventId: string) {
  return gql<{ handicapMarks: { blockDiameterMm: number; marks: { athleteId: string; expectedHundredths: number | null; n: number; suggestedSeconds: number | null; overrideSeconds: number | null; markSeconds: number | null; flags: string[] }[] } }>(
    app,
    'query($e: ID!) { handicapMarks(meetEventId: $e) { blockDiameterMm marks { athleteId expectedHundredths n suggestedSeconds overrideSeconds markSeconds flags } } }',
    { e: meetEventId },
    { token },
  );
}

export function setHandicapMarks(app: INestApplication, token: string | undefined, meetEventId: string, marks: Record<string, unknown>[]) {
  return gql<{ setHandicapMarks: { marks: { athleteId: string; suggestedSeconds: number | null; overrideSeconds: number | null; markSeconds: number | null }[] } }>(
    app,
    'mutation($e: ID!, $m: [HandicapMarkInput!]!) { setHandicapMarks(meetEventId: $e, marks: $m) { marks { athleteId suggestedSeconds overrideSeconds markSeconds } } }',
    { e: meetEventId, m: marks },
    { token },
  );
}

const unique = (): string => `${process.pid.toString(36)}${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

/** A fresh season, fresh athletes in one club, and the given simulated results written as past meets. */
export async function writeSimulatedHistory(app: INestApplication, clubId: string, eventTypeId: string, results: readonly RaceResult[]) {
  const db = app.get(DataSource);
  const seasonId = randomUUID();
  const tag = unique();
  await db.query("INSERT INTO seasons (id, name, starts_on, ends_on, is_current) VALUES (?, ?, '2019-09-01', '2020-05-31', 0)", [seasonId, `Test ${tag}`]);
  const athletes = new Map<string, { athleteId: string; clubId: string; name: string }>();
  for (const simId of [...new Set(results.map((r) => r.athleteId))]) {
    const athleteId = randomUUID();
    await db.query("INSERT INTO athletes (id, club_id, first_name, last_name, divisions) VALUES (?, ?, 'Grain', ?, 'MENS')", [athleteId, clubId, `${simId}-${tag}`]);
    athletes.set(simId, { athleteId, clubId, name: `Grain ${simId}-${tag}` });
  }
  await db.transaction((m) => writeHistory(m, { seasonId, hostClubId: clubId, eventTypeId, division: 'MENS', athletes, firstDate: '2019-10-05', meetName: `Test meet ${tag}`, results }));
  return { db, seasonId, athletes, tag };
}
