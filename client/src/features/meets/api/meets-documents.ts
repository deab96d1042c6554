import { gql, type TypedDocumentNode } from '@apollo/client';

import type {
  ClubOption,
  MeetChange,
  ClubRoster,
  Entry,
  EventType,
  MeetDetail,
  MeetEvent,
  MeetEventInput,
  MeetInput,
  MeetsFilter,
  MeetStatus,
  MeetSummary,
  Season,
} from './types.js';

// Meet and MeetDetail are separate GraphQL types, so the common fields are spliced in as text.
const MEET_FIELDS = `
  id name seasonId seasonName hostClubId hostClubName startsOn venue entryDeadline divisions status
  entriesOpen eventCount entryCount scoringScheme pointsTable bestEntryPerClub minimumOnePoint
  runOffTopPlaces maxEventsPerAthlete requireMixedPairs
`;

const EVENT_TYPE_FIELDS = gql`
  fragment EventTypeFields on EventType {
    id
    code
    name
    resultKind
    teamSize
    mixedPair
    usesHead
    description
    defaultDiameters {
      division
      diameterMm
    }
  }
`;

const MEET_EVENT_FIELDS = gql`
  fragment MeetEventFields on MeetEvent {
    id
    meetId
    position
    eventType {
      ...EventTypeFields
    }
    division
    speciesId
    speciesName
    diameterMm
    timeLimitHundredths
    weight
    notes
    scoringScheme
    pointsTable
    heatSize
    drawSeed
    entries {
      id
      meetEventId
      clubId
      clubName
      clubShortName
      label
      athletes {
        id
        name
      }
      drawPosition
      heat
    }
  }
  ${EVENT_TYPE_FIELDS}
`;

const meets: TypedDocumentNode<{ meets: MeetSummary[] }, { filter: MeetsFilter }> = gql`
  query Meets($filter: MeetsFilter) {
    meets(filter: $filter) {
      ${MEET_FIELDS}
    }
  }
`;

/** Seasons and clubs for the filters and the builder's pickers. */
const leagueOptions: TypedDocumentNode<{ seasons: Season[]; clubs: ClubOption[] }, Record<string, never>> = gql`
  query LeagueOptions {
    seasons {
      id
      name
      startsOn
      endsOn
      isCurrent
    }
    clubs {
      id
      name
      shortName
    }
  }
`;

const eventTypes: TypedDocumentNode<{ eventTypes: EventType[] }, Record<string, never>> = gql`
  query EventTypes {
    eventTypes {
      ...EventTypeFields
    }
  }
  ${EVENT_TYPE_FIELDS}
`;

const meet: TypedDocumentNode<{ meet: MeetDetail }, { id: string }> = gql`
  query Meet($id: ID!) {
    meet(id: $id) {
      ${MEET_FIELDS}
      canManage
      enterableClubIds
      isTimekeeper
      events {
        ...MeetEventFields
      }
    }
  }
  ${MEET_EVENT_FIELDS}
`;

const clubRoster: TypedDocumentNode<{ club: ClubRoster }, { id: string }> = gql`
  query ClubRoster($id: ID!) {
    club(id: $id) {
      id
      name
      shortName
      roster {
        id
        name
        divisions
      }
    }
  }
`;

const createMeet: TypedDocumentNode<{ createMeet: { id: string } }, { input: MeetInput }> = gql`
  mutation CreateMeet($input: MeetInput!) {
    createMeet(input: $input) {
      id
    }
  }
`;

const updateMeet: TypedDocumentNode<{ updateMeet: MeetSummary }, { id: string; input: MeetInput }> = gql`
  mutation UpdateMeet($id: ID!, $input: MeetInput!) {
    updateMeet(id: $id, input: $input) {
      ${MEET_FIELDS}
    }
  }
`;

const setMeetStatus: TypedDocumentNode<{ setMeetStatus: MeetSummary }, { id: string; status: MeetStatus }> = gql`
  mutation SetMeetStatus($id: ID!, $status: MeetStatus!) {
    setMeetStatus(id: $id, status: $status) {
      ${MEET_FIELDS}
    }
  }
`;

const deleteMeet: TypedDocumentNode<{ deleteMeet: boolean }, { id: string }> = gql`
  mutation DeleteMeet($id: ID!) {
    deleteMeet(id: $id)
  }
`;

const addMeetEvent: TypedDocumentNode<{ addMeetEvent: MeetEvent }, { meetId: string; input: MeetEventInput }> = gql`
  mutation AddMeetEvent($meetId: ID!, $input: MeetEventInput!) {
    addMeetEvent(meetId: $meetId, input: $input) {
      ...MeetEventFields
    }
  }
  ${MEET_EVENT_FIELDS}
`;

const updateMeetEvent: TypedDocumentNode<{ updateMeetEvent: MeetEvent }, { id: string; input: MeetEventInput }> = gql`
  mutation UpdateMeetEvent($id: ID!, $input: MeetEventInput!) {
    updateMeetEvent(id: $id, input: $input) {
      ...MeetEventFields
    }
  }
  ${MEET_EVENT_FIELDS}
`;

const removeMeetEvent: TypedDocumentNode<{ removeMeetEvent: boolean }, { id: string }> = gql`
  mutation RemoveMeetEvent($id: ID!) {
    removeMeetEvent(id: $id)
  }
`;

const drawOrder: TypedDocumentNode<
  { drawOrder: MeetEvent },
  { input: { meetEventId: string; heatSize: number; seed?: number | null } }
> = gql`
  mutation DrawOrder($input: DrawOrderInput!) {
    drawOrder(input: $input) {
      ...MeetEventFields
    }
  }
  ${MEET_EVENT_FIELDS}
`;

const enterMeetEvent: TypedDocumentNode<
  { enterMeetEvent: Entry },
  { input: { meetEventId: string; clubId: string; athleteIds: string[] } }
> = gql`
  mutation EnterMeetEvent($input: EnterMeetEventInput!) {
    enterMeetEvent(input: $input) {
      id
      label
    }
  }
`;

const withdrawEntry: TypedDocumentNode<{ withdrawEntry: boolean }, { entryId: string }> = gql`
  mutation WithdrawEntry($entryId: ID!) {
    withdrawEntry(entryId: $entryId)
  }
`;

const meetChanges: TypedDocumentNode<{ meetChanges: MeetChange[] }, { meetId: string }> = gql`
  query MeetChanges($meetId: ID!) {
    meetChanges(meetId: $meetId) {
      id
      summary
      byName
      at
      before
      after
    }
  }
`;

export const meetsDocuments = {
  meetChanges,
  meets,
  leagueOptions,
  eventTypes,
  meet,
  clubRoster,
  createMeet,
  updateMeet,
  setMeetStatus,
  deleteMeet,
  addMeetEvent,
  updateMeetEvent,
  removeMeetEvent,
  drawOrder,
  enterMeetEvent,
  withdrawEntry,
};
