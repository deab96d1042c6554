// Shapes of the Rack API (server/schema.gql); replace with generated types once codegen lands.
import type { ExperienceLevel } from '@endgrain/shared';

export type { ExperienceLevel };
export type UnitPreference = 'METRIC' | 'IMPERIAL';
export type Grind = 'FLAT' | 'CONVEX' | 'CHISEL' | 'COMPOUND';
export type AxeStatus = 'READY' | 'NEEDS_EDGE' | 'NEEDS_HANDLE' | 'HEAD_LOOSE' | 'RETIRED';
export type AxeUse = 'ANYONE' | 'DEVELOPING_UP' | 'EXPERIENCED_ONLY';
export type AxeServiceKind = 'REGRIND' | 'HONE' | 'REHANG' | 'TIGHTEN_OR_PIN' | 'INSPECT' | 'RETIRE' | 'SETUP_CORRECTED';

export interface HeadGeometry {
  includedAngleDeg: number | null;
  perSideAngleDeg: number | null;
  chiselWidthMm: number | null;
  shoulderThicknessMm: number | null;
}

export interface Axe {
  __typename?: 'Axe' | 'AxeDetail';
  id: string;
  clubId: string;
  clubName: string;
  label: string;
  maker: string;
  headWeightG: number | null;
  bitWidthMm: number | null;
  grind: Grind;
  geometry: HeadGeometry;
  handleLengthMm: number | null;
  handleWood: string;
  hangChecked: boolean;
  pinned: boolean;
  status: AxeStatus;
  allowedFor: AxeUse;
  isPublic: boolean;
  notes: string;
  lastServicedOn: string | null;
  photoCount: number;
}

export interface AxePhoto {
  id: string;
  url: string;
  thumbnailUrl: string;
  width: number;
  height: number;
  mimeType: string;
  byteSize: number;
  caption: string;
}

export interface AxeService {
  id: string;
  kind: AxeServiceKind;
  doneOn: string;
  doneBy: string;
  notes: string;
  changes: { field: string; before: string | null; after: string | null }[];
}

export interface AxeDetail extends Axe {
  canManage: boolean;
  photos: AxePhoto[];
  services: AxeService[];
}

export interface Rack {
  clubId: string;
  clubName: string;
  canManage: boolean;
  isMember: boolean;
  axes: Axe[];
}

export interface RackFilter {
  grinds?: Grind[];
  statuses?: AxeStatus[];
  allowedFor?: AxeUse[];
}

/** What the add/edit form sends: SI units (mm, g), angles in degrees. */
export interface AxeInput {
  label: string;
  maker: string;
  headWeightG: number | null;
  bitWidthMm: number | null;
  grind: Grind;
  bevelIncludedDeg: number | null;
  chiselWidthMm: number | null;
  handleLengthMm: number | null;
  handleWood: string;
  hangChecked: boolean;
  pinned: boolean;
  status: AxeStatus;
  allowedFor: AxeUse;
  isPublic: boolean;
  notes: string;
}

export interface AxeSetupChange {
  grind?: Grind;
  bevelIncludedDeg?: number | null;
  chiselWidthMm?: number | null;
  handleLengthMm?: number | null;
  handleWood?: string;
  hangChecked?: boolean;
  pinned?: boolean;
  status?: AxeStatus;
}

export interface AxeServiceInput {
  axeId: string;
  kind: AxeServiceKind;
  doneOn: string;
  doneBy: string | null;
  notes: string;
  setup: AxeSetupChange | null;
}

export interface LineupOverride {
  id: string;
  reason: string;
  byName: string;
  athleteName: string;
  axeLabel: string;
  at?: string;
}

export interface LineupAssignment {
  entryId: string;
  athleteId: string;
  athleteName: string;
  axeId: string | null;
  axeLabel: string | null;
  axeStatus: AxeStatus | null;
  override: LineupOverride | null;
}

export interface LineupEntry {
  entryId: string;
  meetEventId: string;
  eventName: string;
  division: 'MENS' | 'WOMENS' | 'MIXED';
  heat: number | null;
  usesHead: boolean;
  athletes: { id: string; name: string; experience: ExperienceLevel }[];
  assignment: LineupAssignment | null;
  warnings: string[];
}

export interface Lineup {
  meetId: string;
  meetName: string;
  meetDate: string;
  venue: string;
  clubId: string;
  clubName: string;
  canManage: boolean;
  entries: LineupEntry[];
}

export interface AssignLineupInput {
  entryId: string;
  athleteId: string | null;
  axeId: string | null;
  overrideReason: string | null;
}

export interface ClubMeet {
  id: string;
  name: string;
  startsOn: string;
  venue: string;
  status: string;
}
