/** Wood properties as published; a `null` cell is one the table prints no value for. */
export type BotanicalGroup = 'hardwood' | 'softwood';

export interface GreenAndDry {
  green: number | null;
  /** At 12 % moisture content. */
  dry12: number | null;
}

export interface GreenMoisture {
  /** % of oven-dry weight; null where the table prints none. */
  heartwood: number | null;
  sapwood: number | null;
  source: string;
  note?: string;
}

export interface SpeciesRecord {
  id: string;
  commonName: string;
  group: BotanicalGroup;
  /** Oven-dry weight over volume at the stated moisture content. */
  specificGravity: { green: number; dry12: number };
  /** Side (Janka) hardness. */
  hardnessLbf: GreenAndDry;
  hardnessN: GreenAndDry;
  greenMoisture: GreenMoisture | null;
  source: string;
}

export const STRENGTH_SOURCE =
  'USDA Forest Products Laboratory, Wood Handbook (FPL-GTR-190, 2010; same numbering in FPL-GTR-282, 2021), Chapter 5, Table 5-3 "Strength properties of some commercially important woods grown in the United States"';

export const MOISTURE_SOURCE =
  'USDA Forest Products Laboratory, Wood Handbook (FPL-GTR-190, 2010), Chapter 4, Table 4-1 "Average moisture content of green wood"';

const ASPEN_MOISTURE: GreenMoisture = {
  heartwood: 95,
  sapwood: 113,
  source: MOISTURE_SOURCE,
  note: 'Table 4-1 lists "aspen" without separating the species',
};

type Row = [
  id: string,
  commonName: string,
  group: BotanicalGroup,
  sg: [number, number],
  lbf: [number | null, number | null],
  newtons: [number | null, number | null],
  moisture: GreenMoisture | null,
];

function moisture(heartwood: number | null, sapwood: number | null): GreenMoisture {
  return { heartwood, sapwood, source: MOISTURE_SOURCE };
}

// Transcribed cell by cell from Table 5-3; the aspens and balsam poplar print no hardness,
// and several green-wood newton cells are blank ("—") although the lbf cell is printed.
const ROWS: Row[] = [
  ['quaking-aspen', 'quaking aspen', 'hardwood', [0.35, 0.38], [300, 350], [1300, 1600], ASPEN_MOISTURE],
  ['bigtooth-aspen', 'bigtooth aspen', 'hardwood', [0.36, 0.39], [null, null], [null, null], ASPEN_MOISTURE],
  ['eastern-cottonwood', 'eastern cottonwood', 'hardwood', [0.37, 0.4], [340, 430], [null, 1900], null],
  ['black-cottonwood', 'black cottonwood', 'hardwood', [0.31, 0.35], [250, 350], [null, 1600], null],
  ['balsam-poplar', 'balsam poplar', 'hardwood', [0.31, 0.34], [null, null], [null, null], null],
  ['yellow-poplar', 'yellow-poplar', 'hardwood', [0.4, 0.42], [440, 540], [2000, 2400], null],
  ['american-basswood', 'American basswood', 'hardwood', [0.32, 0.37], [250, 410], [1100, 1800], moisture(81, 133)],
  ['eastern-white-pine', 'eastern white pine', 'softwood', [0.34, 0.35], [290, 380], [null, 1700], null],
  ['red-alder', 'red alder', 'hardwood', [0.37, 0.41], [440, 590], [2000, 2600], moisture(null, 97)],
  ['paper-birch', 'paper birch', 'hardwood', [0.48, 0.55], [560, 910], [2500, 4000], moisture(89, 72)],
  ['red-maple', 'red maple', 'hardwood', [0.49, 0.54], [700, 950], [null, 4200], null],
  ['sugar-maple', 'sugar maple', 'hardwood', [0.56, 0.63], [970, 1450], [4300, 6400], null],
  ['white-ash', 'white ash', 'hardwood', [0.55, 0.6], [960, 1320], [null, 5900], moisture(46, 44)],
  ['northern-red-oak', 'northern red oak', 'hardwood', [0.56, 0.63], [1000, 1290], [4400, 5700], null],
];

export const SPECIES_TABLE: readonly SpeciesRecord[] = ROWS.map(
  ([id, commonName, group, sg, lbf, newtons, greenMoisture]) => ({
    id,
    commonName,
    group,
    specificGravity: { green: sg[0], dry12: sg[1] },
    hardnessLbf: { green: lbf[0], dry12: lbf[1] },
    hardnessN: { green: newtons[0], dry12: newtons[1] },
    greenMoisture,
    source: STRENGTH_SOURCE,
  }),
);
