export type EvidenceLabel = 'strong' | 'suggestive' | 'not-enough-data';

export interface GrainMapFilter {
  eventTypeId: string;
  division?: string;
  seasonIds?: string[];
  clubIds?: string[];
  condition?: string;
  diameterMinMm?: number;
  diameterMaxMm?: number;
  bevelBand?: string;
  chiselBand?: string;
}

export interface GrainCell {
  key: string;
  speciesId: string;
  grind: string;
  condition: string | null;
  results: number;
  athletes: number;
  medianHundredths: number;
  lowHundredths: number;
  highHundredths: number;
  effect: number | null;
  effectLow: number | null;
  effectHigh: number | null;
  effectResults: number;
  effectAthletes: number;
  clearDifference: boolean;
  label: EvidenceLabel;
}

export interface TrialCell {
  key: string;
  speciesId: string;
  condition: string;
  grind: string;
  axeRows: number;
  trials: number;
  ratio: number;
  ratioLow: number;
  ratioHigh: number;
  label: EvidenceLabel;
}

export interface GrainSpecies {
  speciesId: string;
  name: string;
  sentence: string;
  results: number;
  specificGravityGreen: number | null;
  specificGravityDry: number | null;
  hardnessLbfGreen: number | null;
  hardnessLbfDry: number | null;
  source: string | null;
}

export interface GrainSettings {
  referenceMm: number;
  exponent: number;
  exponentSource: string;
  exponentNote: string;
  resamples: number;
  seed: number;
  level: number;
  minResults: number;
  minAthletes: number;
  strongMinResults: number;
  strongMinAthletes: number;
  strongMaxP: number;
  clearMaxP: number;
}

export interface GrainMap {
  eventTypeId: string;
  eventName: string;
  totalResults: number;
  skipped: number;
  grinds: string[];
  cells: GrainCell[];
  trials: TrialCell[];
  species: GrainSpecies[];
  settings: GrainSettings;
}

export interface GrainRow {
  resultId: string;
  athleteName: string;
  meetName: string;
  meetDate: string;
  condition: string | null;
  diameterMm: number;
  hundredths: number;
  normalisedHundredths: number;
  ratio: number | null;
  includedDeg: number | null;
  chiselWidthMm: number | null;
}

export interface GrainTrialRow {
  trialId: string;
  testedOn: string;
  condition: string;
  diameterMm: number;
  axeLabel: string;
  ratioToReference: number;
}

export interface GrainCellDetail {
  speciesId: string;
  grind: string;
  cells: GrainCell[];
  rows: GrainRow[];
  trials: TrialCell[];
  trialRows: GrainTrialRow[];
}

export interface GrainOptions {
  eventTypes: { id: string; code: string; name: string; resultKind: string; teamSize: number }[];
  seasons: { id: string; name: string; isCurrent: boolean }[];
  clubs: { id: string; name: string; shortName: string }[];
}
