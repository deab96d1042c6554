// Shapes of the trials API (server/src/trials); replace with generated types once codegen lands.
export type TrialCondition = 'GREEN' | 'SEASONED' | 'DRY' | 'PUNKY' | 'FROZEN';
export type EdgeKeenness = 'DULL' | 'WORKING' | 'KEEN';
export type Grind = 'FLAT' | 'CONVEX' | 'CHISEL' | 'COMPOUND';
export type TrialFlag = 'BINDS' | 'PLACED_AFTER_RELEASING_AXES' | 'RELEASE_NOT_RECORDED' | 'EDGE_DULL' | 'FEW_SWINGS' | 'NO_COUNTED_SWINGS';
export type UnitPreference = 'METRIC' | 'IMPERIAL';

export interface TrialHead {
  grind: Grind;
  bevelIncludedDeg: number | null;
  chiselWidthMm: number | null;
}

export interface TrialListItem {
  id: string;
  testedOn: string;
  speciesId: string;
  speciesName: string;
  condition: TrialCondition;
  diameterMm: number;
  referenceAxeLabel: string;
  axeCount: number;
  leaderLabel: string | null;
  published: boolean;
}

export interface TrialList {
  clubId: string;
  clubName: string;
  canRecord: boolean;
  trials: TrialListItem[];
}

export interface TrialTester {
  id: string;
  athleteId: string | null;
  name: string;
}

export interface TrialSwing {
  depthMm: number;
  opening: boolean;
}

export interface TrialRun {
  id: string;
  axeId: string;
  axeLabel: string;
  testerId: string;
  testerName: string;
  swings: TrialSwing[];
  releaseStep: number | null;
  keenness: EdgeKeenness | null;
  feel: string;
  notes: string;
  head: TrialHead;
}

export interface TrialRankingRow {
  axeId: string;
  axeLabel: string;
  isReference: boolean;
  head: TrialHead | null;
  testers: string[];
  counted: number;
  openingExcluded: number;
  meanMm: number | null;
  sdMm: number | null;
  ratioToReference: number | null;
  sameTesterRatio: number | null;
  testersWithoutReference: string[];
  releaseStep: number | null;
  keenness: EdgeKeenness | null;
  depthPlace: number | null;
  verdictPlace: number | null;
  flags: TrialFlag[];
  notes: string[];
}

export interface TrialTesterEffect {
  axeId: string;
  axeLabel: string;
  highToLowRatio: number | null;
  byTester: { testerId: string; testerName: string; counted: number; meanMm: number }[];
}

export interface TrialFinding {
  title: string;
  summary: string;
  bodyMarkdown: string;
  fieldNoteId: string | null;
  fieldNoteSlug: string | null;
  publishedAt: string;
}

export interface Trial extends TrialListItem {
  clubId: string;
  clubName: string;
  woodLabel: string;
  knots: string;
  faceUsed: string;
  airTempC: number | null;
  frozenWarning: boolean;
  referenceAxeId: string;
  notes: string;
  version: number;
  canEdit: boolean;
  updatedAt: string;
  testers: TrialTester[];
  runs: TrialRun[];
  ranking: TrialRankingRow[];
  testerEffects: TrialTesterEffect[];
  recommendation: string;
  finding: TrialFinding | null;
}

export interface TrialAxeOption {
  id: string;
  label: string;
  grind: Grind;
  bevelIncludedDeg: number | null;
  chiselWidthMm: number | null;
  status: string;
  usable: boolean;
}

export interface TrialSetup {
  clubId: string;
  clubName: string;
  axes: TrialAxeOption[];
  athletes: { id: string; name: string }[];
}

export interface SaveTrialInput {
  id: string;
  clubId: string;
  baseVersion: number | null;
  saveToken: string;
  unansweredToken: string | null;
  testedOn: string;
  speciesId: string;
  diameterMm: number;
  condition: TrialCondition;
  knots: string;
  faceUsed: string;
  airTempC: number | null;
  referenceAxeId: string;
  notes: string;
  testers: { id: string; athleteId: string | null; name: string }[];
  runs: {
    id: string;
    axeId: string;
    testerId: string;
    swings: TrialSwing[];
    releaseStep: number | null;
    keenness: EdgeKeenness | null;
    feel: string;
    notes: string;
  }[];
}
