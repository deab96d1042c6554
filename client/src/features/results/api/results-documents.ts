import { gql, type TypedDocumentNode } from '@apollo/client';

import type {
  AthleteResults,
  CorrectResultInput,
  ExplorerOptions,
  MeetEventResults,
  MeetResults,
  MeetTimekeeper,
  RackAxe,
  RecordResultInput,
  Result,
  ResultAuditEntry,
  ResultRecord,
  ResultsFilter,
  ResultsPage,
  ResultsSort,
} from './types.js';

const RESULT_FIELDS = gql`
  fragment ResultFields on Result {
    id
    entryId
    meetEventId
    meetId
    meetName
    meetDate
    eventTypeId
    eventName
    resultKind
    division
    clubId
    clubName
    clubShortName
    athletes {
      id
      name
    }
    label
    status
    postedStatus
    reason
    rawTimes
    timeHundredths
    penaltyHundredths
    totalHundredths
    score
    place
    tied
    points
    countsForClub
    provisional
    runOffRank
    axeId
    axeLabel
    grind
    bevelIncludedDeg
    chiselWidthMm
    speciesId
    speciesName
    diameterMm
    condition
  }
`;

const EVENT_RESULTS_FIELDS = gql`
  fragment MeetEventResultsFields on MeetEventResults {
    meetEventId
    meetId
    eventTypeId
    eventName
    resultKind
    division
    usesHead
    speciesId
    speciesName
    diameterMm
    timeLimitHundredths
    weight
    provisional
    results {
      ...ResultFields
    }
    waiting {
      id
      clubId
      clubName
      clubShortName
      label
      drawPosition
      heat
    }
  }
  ${RESULT_FIELDS}
`;

const meetResults: TypedDocumentNode<{ meetResults: MeetResults }, { meetId: string }> = gql`
  query MeetResults($meetId: ID!) {
    meetResults(meetId: $meetId) {
      meetId
      meetName
      startsOn
      venue
      seasonId
      seasonName
      status
      published
      canRecord
      canPublish
      asTimekeeper
      events {
        ...MeetEventResultsFields
      }
    }
  }
  ${EVENT_RESULTS_FIELDS}
`;

const recordResult: TypedDocumentNode<{ recordResult: MeetEventResults }, { input: RecordResultInput }> = gql`
  mutation RecordResult($input: RecordResultInput!) {
    recordResult(input: $input) {
      ...MeetEventResultsFields
    }
  }
  ${EVENT_RESULTS_FIELDS}
`;

const correctResult: TypedDocumentNode<{ correctResult: MeetEventResults }, { input: CorrectResultInput }> = gql`
  mutation CorrectResult($input: CorrectResultInput!) {
    correctResult(input: $input) {
      ...MeetEventResultsFields
    }
  }
  ${EVENT_RESULTS_FIELDS}
`;

const publishMeetResults: TypedDocumentNode<{ publishMeetResults: { coachesMailed: number; meet: Pick<MeetResults, 'meetId' | 'status' | 'published'> } }, { meetId: string }> = gql`
  mutation PublishMeetResults($meetId: ID!) {
    publishMeetResults(meetId: $meetId) {
      coachesMailed
      meet {
        meetId
        status
        published
      }
    }
  }
`;

const results: TypedDocumentNode<{ results: ResultsPage }, { filter: ResultsFilter; sort: ResultsSort; page: { page: number; pageSize: number } }> = gql`
  query ResultsExplorer($filter: ResultsFilter, $sort: ResultsSort, $page: PageInput) {
    results(filter: $filter, sort: $sort, page: $page) {
      total
      capped
      page
      pageSize
      rows {
        ...ResultFields
      }
    }
  }
  ${RESULT_FIELDS}
`;

const explorerOptions: TypedDocumentNode<ExplorerOptions, Record<string, never>> = gql`
  query ResultsExplorerOptions {
    seasons {
      id
      name
      isCurrent
    }
    clubs {
      id
      name
      shortName
    }
    eventTypes {
      id
      name
      resultKind
    }
  }
`;

const athleteResults: TypedDocumentNode<{ athleteResults: AthleteResults }, { athleteId: string }> = gql`
  query AthleteResults($athleteId: ID!) {
    athleteResults(athleteId: $athleteId) {
      athleteId
      name
      clubId
      clubName
      personalBests {
        eventTypeId
        eventName
        diameterMm
        result {
          ...ResultFields
        }
      }
      results {
        ...ResultFields
      }
    }
  }
  ${RESULT_FIELDS}
`;

const axeResults: TypedDocumentNode<{ axeResults: Result[] }, { axeId: string }> = gql`
  query AxeResults($axeId: ID!) {
    axeResults(axeId: $axeId) {
      ...ResultFields
    }
  }
  ${RESULT_FIELDS}
`;

const resultAudit: TypedDocumentNode<{ resultAudit: ResultAuditEntry[] }, { meetId: string }> = gql`
  query ResultAudit($meetId: ID!) {
    resultAudit(meetId: $meetId) { id resultId entryId action reason byName at before after }
  }
`;

const TIMEKEEPER_FIELDS = 'userId displayName email appointedAt';

const meetTimekeepers: TypedDocumentNode<{ meetTimekeepers: MeetTimekeeper[] }, { meetId: string }> = gql`
  query MeetTimekeepers($meetId: ID!) {
    meetTimekeepers(meetId: $meetId) { ${TIMEKEEPER_FIELDS} }
  }
`;

const appointTimekeeper: TypedDocumentNode<{ appointTimekeeper: MeetTimekeeper[] }, { meetId: string; email: string }> = gql`
  mutation AppointTimekeeper($meetId: ID!, $email: String!) {
    appointTimekeeper(meetId: $meetId, email: $email) { ${TIMEKEEPER_FIELDS} }
  }
`;

const removeTimekeeper: TypedDocumentNode<{ removeTimekeeper: MeetTimekeeper[] }, { meetId: string; userId: string }> = gql`
  mutation RemoveTimekeeper($meetId: ID!, $userId: ID!) {
    removeTimekeeper(meetId: $meetId, userId: $userId) { ${TIMEKEEPER_FIELDS} }
  }
`;

const records: TypedDocumentNode<{ records: ResultRecord[] }, { filter: { seasonId?: string; eventTypeId?: string; speciesId?: string } }> = gql`
  query ResultRecords($filter: RecordsFilter) {
    records(filter: $filter) {
      eventTypeId
      eventName
      speciesId
      speciesName
      diameterMm
      result {
        ...ResultFields
      }
    }
  }
  ${RESULT_FIELDS}
`;

/** The entrant's club rack as the caller may see it (organisers see the public axes). */
const clubAxes: TypedDocumentNode<{ rack: { clubId: string; axes: RackAxe[] } }, { clubId: string }> = gql`
  query ResultEntryAxes($clubId: ID!) {
    rack(clubId: $clubId) {
      clubId
      axes {
        id
        label
        grind
        status
        geometry {
          includedAngleDeg
          chiselWidthMm
        }
      }
    }
  }
`;

export const resultsDocuments = { meetResults, recordResult, correctResult, publishMeetResults, results, explorerOptions, athleteResults, axeResults, records, clubAxes, meetTimekeepers, appointTimekeeper, removeTimekeeper, resultAudit };
