/** Hand-written to match server/src/insights/models/handicap.model.ts. */
export interface HandicapHistory {
  date: string;
  meetName: string;
  hundredths: number;
  diameterMm: number;
  onBlockHundredths: number;
}

export interface HandicapMark {
  athleteId: string;
  athleteName: string;
  expectedHundredths: number | null;
  n: number;
  used: HandicapHistory[];
  suggestedSeconds: number | null;
  overrideSeconds: number | null;
  overrideNote: string;
  markSeconds: number | null;
  flags: string[];
}

export interface HandicapSheet {
  meetEventId: string;
  meetId: string;
  meetName: string;
  eventName: string;
  division: string;
  blockDiameterMm: number;
  convention: string;
  note: string;
  marks: HandicapMark[];
}

export interface HandicapMarkInput {
  athleteId: string;
  markSeconds: number | null;
  note?: string | null;
}
