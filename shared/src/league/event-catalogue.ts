import type { Division } from './divisions.js';

export type EventResultKind = 'TIMED' | 'SCORED' | 'FEWEST_HITS';

export interface CatalogueEvent {
  code: string;
  name: string;
  resultKind: EventResultKind;
  /** Athletes per entry: 1 single, 2 pair, more a team. */
  teamSize: number;
  /** A pair that must be one woman and one man when the meet asks for it. */
  mixedPair: boolean;
  usesHead: boolean;
  /** Default block diameter per division, mm; null where no block is cut. */
  defaultDiameterMm: Partial<Record<Division, number>> | null;
  defaultPenalties: { label: string; seconds: number }[];
  description: string;
}

// Diameters: common practice in collegiate meets (about 10–12 in for men, smaller for
// women); hosts set their own in each meet event.
const CHOP = { MENS: 305, WOMENS: 254, MIXED: 305 };
const SAW = { MENS: 305, WOMENS: 254, MIXED: 305 };
const FOOT_FAULT = [{ label: 'foot fault', seconds: 5 }];

/** The trade's events, seeded into the event catalogue; admins can add or edit. */
export const EVENT_CATALOGUE: CatalogueEvent[] = [
  { code: 'underhand-chop', name: 'Underhand chop', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: true, defaultDiameterMm: CHOP, defaultPenalties: [], description: 'Standing on the log, the athlete chops through it between their feet.' },
  { code: 'standing-block-chop', name: 'Standing block chop', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: true, defaultDiameterMm: CHOP, defaultPenalties: [], description: 'A vertical block is chopped through from both sides.' },
  { code: 'springboard', name: 'Springboard', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: true, defaultDiameterMm: { MENS: 280, WOMENS: 254, MIXED: 280 }, defaultPenalties: [], description: 'The athlete cuts pockets, climbs on boards and chops the block at the top.' },
  { code: 'single-buck', name: 'Single buck', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: false, defaultDiameterMm: SAW, defaultPenalties: [], description: 'One sawyer with a crosscut saw takes a cookie off the log.' },
  { code: 'double-buck', name: 'Double buck', resultKind: 'TIMED', teamSize: 2, mixedPair: false, usesHead: false, defaultDiameterMm: SAW, defaultPenalties: [], description: 'Two sawyers on one crosscut saw.' },
  { code: 'mixed-double-buck', name: 'Mixed double buck', resultKind: 'TIMED', teamSize: 2, mixedPair: true, usesHead: false, defaultDiameterMm: { MIXED: 305 }, defaultPenalties: [], description: 'A woman and a man on one crosscut saw.' },
  { code: 'bow-saw', name: 'Bow saw', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: false, defaultDiameterMm: { MENS: 152, WOMENS: 152, MIXED: 152 }, defaultPenalties: [], description: 'Cuts through a small log with a bow saw.' },
  { code: 'stock-saw', name: 'Stock saw', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: false, defaultDiameterMm: { MENS: 406, WOMENS: 406, MIXED: 406 }, defaultPenalties: [], description: 'Two cookies with a stock chainsaw, inside the marks.' },
  { code: 'pulp-toss', name: 'Pulp toss', resultKind: 'TIMED', teamSize: 2, mixedPair: false, usesHead: false, defaultDiameterMm: null, defaultPenalties: [], description: 'Partners throw pulp sticks across to each other, standing them in a pen.' },
  { code: 'axe-throw', name: 'Axe throw', resultKind: 'SCORED', teamSize: 1, mixedPair: false, usesHead: true, defaultDiameterMm: null, defaultPenalties: [], description: 'Throws at a ringed target; rings score 5-4-3-2-1.' },
  { code: 'log-roll', name: 'Log roll', resultKind: 'TIMED', teamSize: 2, mixedPair: false, usesHead: false, defaultDiameterMm: null, defaultPenalties: FOOT_FAULT, description: 'Partners roll a log through a course with peaveys or cant hooks.' },
  { code: 'fire-build', name: 'Fire build / water boil', resultKind: 'TIMED', teamSize: 2, mixedPair: false, usesHead: true, defaultDiameterMm: null, defaultPenalties: [], description: 'Split kindling, build a fire and boil a can of water over it.' },
  { code: 'splitting', name: 'Splitting', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: true, defaultDiameterMm: null, defaultPenalties: [], description: 'Splits rounds into pieces small enough to pass a gauge.' },
  { code: 'pole-climb', name: 'Pole climb', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: false, defaultDiameterMm: null, defaultPenalties: [], description: 'Climb a pole with spurs and belt to a mark and back.' },
  { code: 'chain-throw', name: 'Chain throw', resultKind: 'TIMED', teamSize: 1, mixedPair: false, usesHead: false, defaultDiameterMm: null, defaultPenalties: [], description: 'Surveyor\'s chain is thrown and pinned along a line.' },
  { code: 'cookie-stack', name: 'Cookie stack', resultKind: 'SCORED', teamSize: 1, mixedPair: false, usesHead: false, defaultDiameterMm: null, defaultPenalties: [], description: 'The tallest stack of cut cookies that stands wins.' },
  { code: 'horizontal-hit', name: 'Horizontal hits', resultKind: 'FEWEST_HITS', teamSize: 1, mixedPair: false, usesHead: true, defaultDiameterMm: { MENS: 203, WOMENS: 178, MIXED: 203 }, defaultPenalties: [], description: 'Through a small horizontal log in the fewest swings; time breaks ties.' },
];
