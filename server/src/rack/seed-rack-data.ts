import type { AxeServiceKindValue, AxeStatusValue, AxeUseValue, GrindValue } from './entities/rack-values.js';

export interface SeedService {
  kind: AxeServiceKindValue;
  doneOn: string;
  doneBy: string;
  notes: string;
  /** Setup before this service, for the fields it changed (the axe row holds the setup after). */
  before?: Record<string, string | number | boolean | null>;
}

export interface SeedAxe {
  label: string;
  maker: string;
  headWeightG: number;
  bitWidthMm: number;
  grind: GrindValue;
  bevelIncludedDeg: number;
  chiselWidthMm: number | null;
  handleLengthMm: number;
  handleWood: string;
  hangChecked: boolean;
  pinned: boolean;
  status: AxeStatusValue;
  allowedFor: AxeUseValue;
  isPublic: boolean;
  notes: string;
  services: SeedService[];
}

// Invented racks for the demo clubs, keyed by club short name. Makers, people and notes are made up;
// weights and lengths are round imperial sizes in SI (5.5 lb = 2495 g, 30 in = 762 mm).
export const DEMO_RACKS: Record<string, SeedAxe[]> = {
  LARCH: [
    {
      label: 'Race 1', maker: 'Hollowbrook Forge', headWeightG: 2495, bitWidthMm: 133.35, grind: 'COMPOUND', bevelIncludedDeg: 15, chiselWidthMm: 19.05,
      handleLengthMm: 762, handleWood: 'hickory', hangChecked: true, pinned: true, status: 'READY', allowedFor: 'EXPERIENCED_ONLY', isPublic: true,
      notes: 'Softwood racing head; keep it for clean white pine.',
      services: [
        { kind: 'REGRIND', doneOn: '2026-09-20', doneBy: 'Hale Dunmore', notes: 'Closed the bevel for the pine season.', before: { bevelIncludedDeg: 16 } },
        { kind: 'HONE', doneOn: '2026-10-28', doneBy: 'Hale Dunmore', notes: 'Stropped after the autumn meet.' },
        { kind: 'INSPECT', doneOn: '2026-11-15', doneBy: 'Club Coach (demo)', notes: 'Wedge tight, no checks in the handle.' },
      ],
    },
    {
      label: 'Race 2', maker: 'Tallowmere Grinding Co.', headWeightG: 2268, bitWidthMm: 127, grind: 'CONVEX', bevelIncludedDeg: 17, chiselWidthMm: null,
      handleLengthMm: 737, handleWood: 'hickory', hangChecked: true, pinned: true, status: 'NEEDS_EDGE', allowedFor: 'DEVELOPING_UP', isPublic: false,
      notes: 'Crossover head for poplar and aspen.',
      services: [{ kind: 'REHANG', doneOn: '2026-09-12', doneBy: 'Hale Dunmore', notes: 'New handle, hang checked on the bench.', before: { handleLengthMm: 711, hangChecked: false } }],
    },
    {
      label: 'Practice 4', maker: 'Hollowbrook Forge', headWeightG: 1814, bitWidthMm: 114.3, grind: 'FLAT', bevelIncludedDeg: 25, chiselWidthMm: null,
      handleLengthMm: 711, handleWood: 'ash', hangChecked: true, pinned: false, status: 'READY', allowedFor: 'ANYONE', isPublic: false,
      notes: 'Rookie practice axe; forgiving edge.',
      services: [{ kind: 'INSPECT', doneOn: '2026-09-05', doneBy: 'Club Coach (demo)', notes: 'Start-of-season check.' }],
    },
    {
      label: 'Old Blue', maker: 'Ferncombe Smithy', headWeightG: 2041, bitWidthMm: 120.65, grind: 'FLAT', bevelIncludedDeg: 22, chiselWidthMm: null,
      handleLengthMm: 711, handleWood: 'hickory', hangChecked: false, pinned: false, status: 'HEAD_LOOSE', allowedFor: 'ANYONE', isPublic: false,
      notes: 'Head shifted at practice; out of use until it is rehung.',
      services: [{ kind: 'INSPECT', doneOn: '2026-11-20', doneBy: 'Club Coach (demo)', notes: 'Head moves on the handle. Tagged out.', before: { status: 'READY' } }],
    },
  ],
  CFORK: [
    {
      label: 'CF Springboard', maker: 'Ridgeback Edgeworks', headWeightG: 2722, bitWidthMm: 139.7, grind: 'CHISEL', bevelIncludedDeg: 14, chiselWidthMm: 25.4,
      handleLengthMm: 787, handleWood: 'hickory', hangChecked: true, pinned: true, status: 'READY', allowedFor: 'EXPERIENCED_ONLY', isPublic: false,
      notes: 'Board work and standing block.',
      services: [{ kind: 'REGRIND', doneOn: '2026-10-02', doneBy: 'Imogen Tarrant', notes: 'Widened the chisel to an inch.', before: { chiselWidthMm: 19.05 } }],
    },
    {
      label: 'CF Trainer', maker: 'Ridgeback Edgeworks', headWeightG: 2041, bitWidthMm: 120.65, grind: 'FLAT', bevelIncludedDeg: 22, chiselWidthMm: null,
      handleLengthMm: 737, handleWood: 'ash', hangChecked: true, pinned: true, status: 'READY', allowedFor: 'ANYONE', isPublic: true,
      notes: 'First axe for new members.',
      services: [{ kind: 'TIGHTEN_OR_PIN', doneOn: '2026-09-18', doneBy: 'Imogen Tarrant', notes: 'Pinned the wedge.', before: { pinned: false } }],
    },
    {
      label: 'CF Spare', maker: 'Ferncombe Smithy', headWeightG: 2268, bitWidthMm: 127, grind: 'CONVEX', bevelIncludedDeg: 18, chiselWidthMm: null,
      handleLengthMm: 737, handleWood: 'hickory', hangChecked: false, pinned: false, status: 'NEEDS_HANDLE', allowedFor: 'DEVELOPING_UP', isPublic: false,
      notes: 'Handle cracked below the eye.',
      services: [{ kind: 'INSPECT', doneOn: '2026-11-08', doneBy: 'Imogen Tarrant', notes: 'Crack found; handle to be replaced.', before: { status: 'READY' } }],
    },
  ],
};
