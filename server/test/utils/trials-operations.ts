import { randomUUID } from 'node:crypto';

import type { INestApplication } from '@nestjs/common';

import { gql } from './graphql.js';

const RANKING_FIELDS = `axeId axeLabel isReference head { grind bevelIncludedDeg chiselWidthMm } testers counted openingExcluded meanMm sdMm
  ratioToReference sameTesterRatio testersWithoutReference releaseStep keenness depthPlace verdictPlace flags notes`;
export const TRIAL_FIELDS = `id clubId clubName testedOn speciesId speciesName condition diameterMm woodLabel knots faceUsed airTempC frozenWarning
  referenceAxeId referenceAxeLabel notes version canEdit axeCount leaderLabel published
  testers { id athleteId name }
  runs { id axeId axeLabel testerId testerName swings { depthMm opening } releaseStep keenness feel notes head { grind bevelIncludedDeg chiselWidthMm } }
  ranking { ${RANKING_FIELDS} }
  testerEffects { axeId axeLabel highToLowRatio byTester { testerId testerName counted meanMm } }
  recommendation finding { title summary bodyMarkdown fieldNoteId fieldNoteSlug publishedAt }`;

export interface RankingShape {
  axeId: string;
  axeLabel: string;
  isReference: boolean;
  head: { grind: string; bevelIncludedDeg: number | null; chiselWidthMm: number | null } | null;
  counted: number;
  meanMm: number | null;
  ratioToReference: number | null;
  releaseStep: number | null;
  depthPlace: number | null;
  verdictPlace: number | null;
  flags: string[];
}

export interface TrialShape {
  id: string;
  clubId: string;
  condition: string;
  woodLabel: string;
  frozenWarning: boolean;
  version: number;
  canEdit: boolean;
  axeCount: number;
  leaderLabel: string | null;
  published: boolean;
  testers: { id: string; athleteId: string | null; name: string }[];
  runs: { id: string; axeId: string; testerName: string; head: { grind: string; bevelIncludedDeg: number | null; chiselWidthMm: number | null } }[];
  ranking: RankingShape[];
  testerEffects: { axeId: string; highToLowRatio: number | null; byTester: { testerName: string; meanMm: number }[] }[];
  recommendation: string;
  finding: { title: string; bodyMarkdown: string; fieldNoteId: string | null; fieldNoteSlug: string | null } | null;
}

export const counted = (...depths: number[]) => depths.map((depthMm) => ({ depthMm, opening: false }));

export interface RunSpec {
  axeId: string;
  testerId: string;
  swings: { depthMm: number; opening: boolean }[];
  releaseStep?: number | null;
  keenness?: string | null;
}

/** A whole trial as the phone sends it: fresh ids and token, green quaking aspen, 305 mm. */
export function trialInput(clubId: string, referenceAxeId: string, testers: { id: string; name: string; athleteId?: string | null }[], runs: RunSpec[], over: Record<string, unknown> = {}) {
  return {
    id: randomUUID(),
    clubId,
    baseVersion: null,
    saveToken: randomUUID(),
    testedOn: new Date().toISOString().slice(0, 10),
    speciesId: 'quaking-aspen',
    diameterMm: 305,
    condition: 'GREEN',
    knots: '',
    faceUsed: 'north face',
    airTempC: 8,
    referenceAxeId,
    notes: '',
    testers,
    runs: runs.map((r) => ({ id: randomUUID(), feel: '', notes: '', releaseStep: null, keenness: null, ...r })),
    ...over,
  };
}

export function saveTrial(app: INestApplication, token: string, input: Record<string, unknown>) {
  return gql<{ saveTrial: TrialShape }>(app, `mutation($i: SaveTrialInput!) { saveTrial(input: $i) { ${TRIAL_FIELDS} } }`, { i: input }, { token });
}

export function trial(app: INestApplication, id: string, token?: string) {
  return gql<{ trial: TrialShape }>(app, `query($id: ID!) { trial(id: $id) { ${TRIAL_FIELDS} } }`, { id }, { token });
}

export function trials(app: INestApplication, clubId: string, token?: string) {
  return gql<{ trials: { clubName: string; canRecord: boolean; trials: { id: string; condition: string; leaderLabel: string | null; axeCount: number; published: boolean }[] } }>(
    app, 'query($c: ID!) { trials(clubId: $c) { clubName canRecord trials { id testedOn speciesName condition axeCount leaderLabel published } } }', { c: clubId }, { token });
}

export function trialSetup(app: INestApplication, clubId: string, token?: string) {
  return gql<{ trialSetup: { axes: { id: string; label: string; usable: boolean; status: string }[]; athletes: { id: string; name: string }[] } }>(
    app, 'query($c: ID!) { trialSetup(clubId: $c) { clubId clubName axes { id label grind status usable } athletes { id name } } }', { c: clubId }, { token });
}

export function axeTrials(app: INestApplication, axeId: string, token?: string) {
  return gql<{ axeTrials: { trialId: string; isReference: boolean; verdictPlace: number | null; meanMm: number | null; ratioToReference: number | null; flags: string[] }[] }>(
    app, 'query($a: ID!) { axeTrials(axeId: $a) { trialId testedOn woodLabel axeCount isReference verdictPlace meanMm ratioToReference releaseStep flags head { grind } } }', { a: axeId }, { token });
}

export function deleteTrial(app: INestApplication, token: string, id: string) {
  return gql<{ deleteTrial: boolean }>(app, 'mutation($id: ID!) { deleteTrial(id: $id) }', { id }, { token });
}

export function publishTrialFinding(app: INestApplication, token: string, trialId: string) {
  return gql<{ publishTrialFinding: { title: string; fieldNoteId: string | null; fieldNoteSlug: string | null; bodyMarkdown: string } }>(
    app, 'mutation($t: ID!) { publishTrialFinding(trialId: $t) { title summary bodyMarkdown fieldNoteId fieldNoteSlug publishedAt } }', { t: trialId }, { token });
}
