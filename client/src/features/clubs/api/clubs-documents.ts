import { gql, type TypedDocumentNode } from '@apollo/client';

import type { Athlete, AthleteInput, Club, ClubDetail, ClubInput, ClubInvitation, ClubRole } from './types.js';

const ATHLETE_FIELDS = gql`
  fragment AthleteFields on Athlete {
    id
    clubId
    clubName
    firstName
    lastName
    name
    divisions
    experience
    firstSeasonYear
    hasAccount
  }
`;

const INVITATION_FIELDS = gql`
  fragment InvitationFields on ClubInvitation {
    id
    email
    role
    expiresAt
    acceptedAt
  }
`;

const CLUB_FIELDS = gql`
  fragment ClubFields on Club {
    id
    name
    shortName
    region
    colourPrimary
    colourSecondary
    athleteCount
  }
`;

const clubs: TypedDocumentNode<{ clubs: Club[] }, Record<string, never>> = gql`
  query Clubs {
    clubs {
      ...ClubFields
    }
  }
  ${CLUB_FIELDS}
`;

const club: TypedDocumentNode<{ club: ClubDetail }, { id: string }> = gql`
  query Club($id: ID!) {
    club(id: $id) {
      id
      name
      shortName
      region
      contactEmail
      colourPrimary
      colourSecondary
      athleteCount
      canManage
      roster {
        ...AthleteFields
      }
    }
  }
  ${ATHLETE_FIELDS}
`;

const athlete: TypedDocumentNode<{ athlete: Athlete }, { id: string }> = gql`
  query Athlete($id: ID!) {
    athlete(id: $id) {
      ...AthleteFields
    }
  }
  ${ATHLETE_FIELDS}
`;

const clubInvitations: TypedDocumentNode<{ clubInvitations: ClubInvitation[] }, { clubId: string }> = gql`
  query ClubInvitations($clubId: ID!) {
    clubInvitations(clubId: $clubId) {
      ...InvitationFields
    }
  }
  ${INVITATION_FIELDS}
`;

const addAthlete: TypedDocumentNode<{ addAthlete: Athlete }, { input: AthleteInput }> = gql`
  mutation AddAthlete($input: AthleteInput!) {
    addAthlete(input: $input) {
      ...AthleteFields
    }
  }
  ${ATHLETE_FIELDS}
`;

const updateAthlete: TypedDocumentNode<{ updateAthlete: Athlete }, { id: string; input: AthleteInput }> = gql`
  mutation UpdateAthlete($id: ID!, $input: AthleteInput!) {
    updateAthlete(id: $id, input: $input) {
      ...AthleteFields
    }
  }
  ${ATHLETE_FIELDS}
`;

const removeAthlete: TypedDocumentNode<{ removeAthlete: boolean }, { id: string }> = gql`
  mutation RemoveAthlete($id: ID!) {
    removeAthlete(id: $id)
  }
`;

const inviteToClub: TypedDocumentNode<
  { inviteToClub: ClubInvitation },
  { input: { clubId: string; email: string; role: ClubRole } }
> = gql`
  mutation InviteToClub($input: InviteToClubInput!) {
    inviteToClub(input: $input) {
      ...InvitationFields
    }
  }
  ${INVITATION_FIELDS}
`;

const acceptClubInvitation: TypedDocumentNode<{ acceptClubInvitation: string }, { token: string }> = gql`
  mutation AcceptClubInvitation($token: String!) {
    acceptClubInvitation(token: $token)
  }
`;

const updateClub: TypedDocumentNode<{ updateClub: Club }, { id: string; input: ClubInput }> = gql`
  mutation UpdateClub($id: ID!, $input: ClubInput!) {
    updateClub(id: $id, input: $input) {
      ...ClubFields
    }
  }
  ${CLUB_FIELDS}
`;

const createClub: TypedDocumentNode<{ createClub: Club }, { input: ClubInput }> = gql`
  mutation CreateClub($input: ClubInput!) {
    createClub(input: $input) {
      ...ClubFields
    }
  }
  ${CLUB_FIELDS}
`;

export const clubsDocuments = {
  createClub,
  updateClub,
  clubs,
  club,
  athlete,
  clubInvitations,
  addAthlete,
  updateAthlete,
  removeAthlete,
  inviteToClub,
  acceptClubInvitation,
};
