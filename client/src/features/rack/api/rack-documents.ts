import { gql, type TypedDocumentNode } from '@apollo/client';

import type {
  AssignLineupInput,
  AxeDetail,
  AxeInput,
  AxeServiceInput,
  ClubMeet,
  Lineup,
  LineupAssignment,
  LineupOverride,
  Rack,
  RackFilter,
} from './types.js';

// Axe and AxeDetail are separate object types, so their fragments share the field list as text.
const AXE_SCALARS = `
  id
  clubId
  clubName
  label
  maker
  headWeightG
  bitWidthMm
  grind
  geometry {
    includedAngleDeg
    perSideAngleDeg
    chiselWidthMm
    shoulderThicknessMm
  }
  handleLengthMm
  handleWood
  hangChecked
  pinned
  status
  allowedFor
  isPublic
  notes
  lastServicedOn
  photoCount
`;

const AXE_FIELDS = gql`
  fragment RackAxeFields on Axe {
    ${AXE_SCALARS}
  }
`;

const DETAIL_FIELDS = gql`
  fragment RackAxeDetailFields on AxeDetail {
    ${AXE_SCALARS}
    canManage
    photos {
      id
      url
      thumbnailUrl
      width
      height
      mimeType
      byteSize
      caption
    }
    services {
      id
      kind
      doneOn
      doneBy
      notes
      changes {
        field
        before
        after
      }
    }
  }
`;

const ASSIGNMENT_FIELDS = gql`
  fragment LineupAssignmentFields on LineupAssignment {
    entryId
    athleteId
    athleteName
    axeId
    axeLabel
    axeStatus
    override {
      id
      reason
      byName
      athleteName
      axeLabel
    }
  }
`;

const rack: TypedDocumentNode<{ rack: Rack }, { clubId: string; filter?: RackFilter | null }> = gql`
  query Rack($clubId: ID!, $filter: RackFilter) {
    rack(clubId: $clubId, filter: $filter) {
      clubId
      clubName
      canManage
      isMember
      axes {
        ...RackAxeFields
      }
    }
  }
  ${AXE_FIELDS}
`;

const axe: TypedDocumentNode<{ axe: AxeDetail }, { id: string }> = gql`
  query Axe($id: ID!) {
    axe(id: $id) {
      ...RackAxeDetailFields
    }
  }
  ${DETAIL_FIELDS}
`;

const addAxe: TypedDocumentNode<{ addAxe: AxeDetail }, { clubId: string; input: AxeInput }> = gql`
  mutation AddAxe($clubId: ID!, $input: AxeInput!) {
    addAxe(clubId: $clubId, input: $input) {
      ...RackAxeDetailFields
    }
  }
  ${DETAIL_FIELDS}
`;

const updateAxe: TypedDocumentNode<{ updateAxe: AxeDetail }, { id: string; input: AxeInput }> = gql`
  mutation UpdateAxe($id: ID!, $input: AxeInput!) {
    updateAxe(id: $id, input: $input) {
      ...RackAxeDetailFields
    }
  }
  ${DETAIL_FIELDS}
`;

const logAxeService: TypedDocumentNode<{ logAxeService: AxeDetail }, { input: AxeServiceInput }> = gql`
  mutation LogAxeService($input: AxeServiceInput!) {
    logAxeService(input: $input) {
      ...RackAxeDetailFields
    }
  }
  ${DETAIL_FIELDS}
`;

const removeAxePhoto: TypedDocumentNode<{ removeAxePhoto: boolean }, { id: string }> = gql`
  mutation RemoveAxePhoto($id: ID!) {
    removeAxePhoto(id: $id)
  }
`;

const clubMeets: TypedDocumentNode<{ meets: ClubMeet[] }, { clubId: string }> = gql`
  query RackClubMeets($clubId: ID!) {
    meets(filter: { clubId: $clubId, when: UPCOMING }) {
      id
      name
      startsOn
      venue
      status
    }
  }
`;

const lineup: TypedDocumentNode<{ lineup: Lineup }, { meetId: string; clubId: string }> = gql`
  query Lineup($meetId: ID!, $clubId: ID!) {
    lineup(meetId: $meetId, clubId: $clubId) {
      meetId
      meetName
      meetDate
      venue
      clubId
      clubName
      canManage
      entries {
        entryId
        meetEventId
        eventName
        division
        heat
        usesHead
        athletes {
          id
          name
          experience
        }
        assignment {
          ...LineupAssignmentFields
        }
        warnings
      }
    }
  }
  ${ASSIGNMENT_FIELDS}
`;

const assignLineup: TypedDocumentNode<{ assignLineup: { warnings: string[]; assignment: LineupAssignment } }, { input: AssignLineupInput }> = gql`
  mutation AssignLineup($input: AssignLineupInput!) {
    assignLineup(input: $input) {
      warnings
      assignment {
        ...LineupAssignmentFields
      }
    }
  }
  ${ASSIGNMENT_FIELDS}
`;

const clearLineupAssignment: TypedDocumentNode<{ clearLineupAssignment: boolean }, { entryId: string }> = gql`
  mutation ClearLineupAssignment($entryId: ID!) {
    clearLineupAssignment(entryId: $entryId)
  }
`;

const lineupOverrides: TypedDocumentNode<{ lineupOverrides: (LineupOverride & { at: string })[] }, { meetId: string; clubId: string }> = gql`
  query LineupOverrides($meetId: ID!, $clubId: ID!) {
    lineupOverrides(meetId: $meetId, clubId: $clubId) {
      id
      reason
      byName
      athleteName
      axeLabel
      at
    }
  }
`;

const allClubs: TypedDocumentNode<{ clubs: { id: string; name: string }[] }, Record<string, never>> = gql`
  query RackAllClubs {
    clubs {
      id
      name
    }
  }
`;

const deleteAxe: TypedDocumentNode<{ deleteAxe: boolean }, { id: string }> = gql`
  mutation DeleteAxe($id: ID!) {
    deleteAxe(id: $id)
  }
`;

export const rackDocuments = { allClubs, rack, axe, addAxe, updateAxe, deleteAxe, logAxeService, removeAxePhoto, clubMeets, lineup, assignLineup, clearLineupAssignment, lineupOverrides };
