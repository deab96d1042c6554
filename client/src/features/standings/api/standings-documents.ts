import { gql, type TypedDocumentNode } from '@apollo/client';

import type { MeetStandings, SeasonOption, SeasonStandings } from './types.js';

const DIVISION_FIELDS = gql`
  fragment DivisionStandingFields on DivisionStanding {
    division
    provisional
    clubs {
      clubId
      clubName
      clubShortName
      points
      place
      tied
      placeCounts
      meets
    }
  }
`;

const seasonStandings: TypedDocumentNode<{ standings: SeasonStandings }, { seasonId: string }> = gql`
  query SeasonStandings($seasonId: ID!) {
    standings(seasonId: $seasonId) {
      seasonId
      seasonName
      tieBreak
      provisional
      meets {
        id
        name
        startsOn
      }
      divisions {
        ...DivisionStandingFields
      }
    }
  }
  ${DIVISION_FIELDS}
`;

const meetStandings: TypedDocumentNode<{ meetStandings: MeetStandings }, { meetId: string }> = gql`
  query MeetStandings($meetId: ID!) {
    meetStandings(meetId: $meetId) {
      meetId
      meetName
      published
      tieBreak
      provisional
      divisions {
        ...DivisionStandingFields
      }
      eventWinners {
        id
        meetEventId
        eventName
        division
        label
        clubShortName
        resultKind
        totalHundredths
        score
        tied
      }
    }
  }
  ${DIVISION_FIELDS}
`;

const seasons: TypedDocumentNode<{ seasons: SeasonOption[] }, Record<string, never>> = gql`
  query StandingsSeasons {
    seasons {
      id
      name
      isCurrent
    }
  }
`;

export const standingsDocuments = { seasonStandings, meetStandings, seasons };
