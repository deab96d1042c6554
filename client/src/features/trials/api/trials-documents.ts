import { gql, type TypedDocumentNode } from '@apollo/client';

import type { SaveTrialInput, Trial, TrialFinding, TrialList, TrialSetup } from './types.js';

const LIST_FIELDS = 'id testedOn speciesId speciesName condition diameterMm referenceAxeLabel axeCount leaderLabel published';
const HEAD = 'head { grind bevelIncludedDeg chiselWidthMm }';
const FINDING_FIELDS = 'title summary bodyMarkdown fieldNoteId fieldNoteSlug publishedAt';
const TRIAL_FIELDS = `${LIST_FIELDS} clubId clubName woodLabel knots faceUsed airTempC frozenWarning referenceAxeId notes version canEdit updatedAt
  testers { id athleteId name }
  runs { id axeId axeLabel testerId testerName swings { depthMm opening } releaseStep keenness feel notes ${HEAD} }
  ranking { axeId axeLabel isReference ${HEAD} testers counted openingExcluded meanMm sdMm ratioToReference sameTesterRatio
    testersWithoutReference releaseStep keenness depthPlace verdictPlace flags notes }
  testerEffects { axeId axeLabel highToLowRatio byTester { testerId testerName counted meanMm } }
  recommendation finding { ${FINDING_FIELDS} }`;

const trials: TypedDocumentNode<{ trials: TrialList }, { clubId: string }> = gql`
  query Trials($clubId: ID!) {
    trials(clubId: $clubId) { clubId clubName canRecord trials { ${LIST_FIELDS} } }
  }
`;

const trial: TypedDocumentNode<{ trial: Trial }, { id: string }> = gql`
  query Trial($id: ID!) {
    trial(id: $id) { ${TRIAL_FIELDS} }
  }
`;

const trialSetup: TypedDocumentNode<{ trialSetup: TrialSetup }, { clubId: string }> = gql`
  query TrialSetup($clubId: ID!) {
    trialSetup(clubId: $clubId) { clubId clubName axes { id label grind bevelIncludedDeg chiselWidthMm status usable } athletes { id name } }
  }
`;

const clubs: TypedDocumentNode<{ clubs: { id: string; name: string }[] }, Record<string, never>> = gql`
  query TrialClubs {
    clubs { id name }
  }
`;

const saveTrial: TypedDocumentNode<{ saveTrial: Trial }, { input: SaveTrialInput }> = gql`
  mutation SaveTrial($input: SaveTrialInput!) {
    saveTrial(input: $input) { ${TRIAL_FIELDS} }
  }
`;

const deleteTrial: TypedDocumentNode<{ deleteTrial: boolean }, { id: string }> = gql`
  mutation DeleteTrial($id: ID!) {
    deleteTrial(id: $id)
  }
`;

const publishTrialFinding: TypedDocumentNode<{ publishTrialFinding: TrialFinding }, { trialId: string }> = gql`
  mutation PublishTrialFinding($trialId: ID!) {
    publishTrialFinding(trialId: $trialId) { ${FINDING_FIELDS} }
  }
`;

export const trialsDocuments = { trials, trial, trialSetup, clubs, saveTrial, deleteTrial, publishTrialFinding };
