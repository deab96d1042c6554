import { paths } from './paths.js';

export type PlaceKey = 'meets' | 'results' | 'standings' | 'rack' | 'trials' | 'grainMap' | 'fieldNotes' | 'firstCuts';

export interface Place {
  key: PlaceKey;
  label: string;
  href: string;
  /** One sentence on what the place does (shown while it is still being built). */
  summary: string;
  /** On a phone the bottom bar holds the four places people open most; the rest sit under "More". */
  inBottomBar: boolean;
  /** Club data (racks, trials) is for signed-in members only. */
  membersOnly: boolean;
}

// Order is the navigation order.
export const places: readonly Place[] = [
  {
    key: 'meets',
    label: 'Meets',
    href: paths.meets.href(),
    summary:
      'Organisers will build meets here (events, divisions, block species and diameters) and clubs will enter their athletes.',
    inBottomBar: true,
    membersOnly: false,
  },
  {
    key: 'results',
    label: 'Results',
    href: paths.results.href(),
    summary:
      'Every posted time and score, ranked and scored for you, with each result linked to the axe and the wood it was cut with.',
    inBottomBar: true,
    membersOnly: false,
  },
  {
    key: 'standings',
    label: 'Standings',
    href: paths.standings.href(),
    summary: 'Season standings that add up team points across every club and meet, with the tie-break spelled out.',
    inBottomBar: false,
    membersOnly: false,
  },
  {
    key: 'rack',
    label: 'Rack',
    href: paths.rack.href(),
    summary:
      "Your club's axes (grind, bevel angle, chisel width, handle and edge status) with a service log for every regrind, hone and rehang.",
    inBottomBar: true,
    membersOnly: true,
  },
  {
    key: 'trials',
    label: 'Trials',
    href: paths.trials.href(),
    summary:
      'Record axe tests on a block (swings, depth per swing, how freely the bit comes out) and compare each axe with a reference axe.',
    inBottomBar: false,
    membersOnly: true,
  },
  {
    key: 'grainMap',
    label: 'Grain Map',
    href: paths.grainMap.href(),
    summary:
      "A picture of grind against species that shows what the league's results and trials say about which head setup suits which wood, and how sure that is.",
    inBottomBar: false,
    membersOnly: false,
  },
  {
    key: 'fieldNotes',
    label: 'Field Notes',
    href: paths.fieldNotes.href(),
    summary: 'Findings, guides and safety notes written by coaches, each backed by the trials and results behind it.',
    inBottomBar: true,
    membersOnly: false,
  },
  {
    key: 'firstCuts',
    label: 'First Cuts',
    href: paths.firstCuts.href(),
    summary: 'A hand-picked series of guides that takes a newcomer from a first careful swing to a first meet.',
    inBottomBar: false,
    membersOnly: false,
  },
];
