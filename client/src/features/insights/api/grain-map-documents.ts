import { gql, type TypedDocumentNode } from '@apollo/client';

import type { GrainCellDetail, GrainMap, GrainMapFilter, GrainOptions } from './types.js';

const CELL = `key speciesId grind condition results athletes medianHundredths lowHundredths highHundredths
  effect effectLow effectHigh effectResults effectAthletes clearDifference label`;
const TRIAL = 'key speciesId condition grind axeRows trials ratio ratioLow ratioHigh label';

export const grainMapDocuments = {
  options: gql`
    query GrainOptions {
      eventTypes { id code name resultKind teamSize }
      seasons { id name isCurrent }
      clubs { id name shortName }
    }
  ` as TypedDocumentNode<GrainOptions, Record<string, never>>,
  map: gql`
    query GrainMap($filter: GrainMapFilter!) {
      grainMap(filter: $filter) {
        eventTypeId eventName totalResults skipped grinds
        cells { ${CELL} }
        trials { ${TRIAL} }
        species { speciesId name sentence results specificGravityGreen specificGravityDry hardnessLbfGreen hardnessLbfDry source }
        settings { referenceMm exponent exponentSource exponentNote resamples seed level minResults minAthletes strongMinResults strongMinAthletes strongMaxP clearMaxP }
      }
    }
  ` as TypedDocumentNode<{ grainMap: GrainMap }, { filter: GrainMapFilter }>,
  cell: gql`
    query GrainCell($filter: GrainMapFilter!, $species: String!, $grind: String!) {
      grainCell(filter: $filter, species: $species, grind: $grind) {
        speciesId grind
        cells { ${CELL} }
        rows { resultId athleteName meetName meetDate condition diameterMm hundredths normalisedHundredths ratio includedDeg chiselWidthMm }
        trials { ${TRIAL} }
        trialRows { trialId testedOn condition diameterMm axeLabel ratioToReference }
      }
    }
  ` as TypedDocumentNode<{ grainCell: GrainCellDetail }, { filter: GrainMapFilter; species: string; grind: string }>,
};
