import { gql, type TypedDocumentNode } from '@apollo/client';

import type { HandicapMarkInput, HandicapSheet } from './handicap-types.js';

const SHEET = `meetEventId meetId meetName eventName division blockDiameterMm convention note
  marks { athleteId athleteName expectedHundredths n suggestedSeconds overrideSeconds overrideNote markSeconds flags
    used { date meetName hundredths diameterMm onBlockHundredths } }`;

export const handicapDocuments = {
  sheet: gql`
    query HandicapMarks($meetEventId: ID!) { handicapMarks(meetEventId: $meetEventId) { ${SHEET} } }
  ` as TypedDocumentNode<{ handicapMarks: HandicapSheet }, { meetEventId: string }>,
  save: gql`
    mutation SetHandicapMarks($meetEventId: ID!, $marks: [HandicapMarkInput!]!) {
      setHandicapMarks(meetEventId: $meetEventId, marks: $marks) { ${SHEET} }
    }
  ` as TypedDocumentNode<{ setHandicapMarks: HandicapSheet }, { meetEventId: string; marks: HandicapMarkInput[] }>,
};
