import { gql } from '@apollo/client';

export interface AxeTrialsData {
  axeTrials: {
    trialId: string;
    testedOn: string;
    woodLabel: string;
    axeCount: number;
    isReference: boolean;
    verdictPlace: number | null;
  }[];
}

export const AXE_TRIALS = gql`
  query AxeTrials($axeId: ID!) {
    axeTrials(axeId: $axeId) {
      trialId
      testedOn
      woodLabel
      axeCount
      isReference
      verdictPlace
    }
  }
`;
