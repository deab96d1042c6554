import { describe, expect, it } from '@jest/globals';

import type { TrialRunEntity } from './entities/trial-run.entity.js';
import type { TrialTesterEntity } from './entities/trial-tester.entity.js';
import { computeTrial, frozenWarning, toTrialInput, woodLabel, type LoadedTrial } from './trial-mapping.js';
import { TrialFlagEnum } from './models/trials.enums.js';

const tester = (id: string, name: string): TrialTesterEntity => ({ id, name, athleteId: null, trialId: 't', position: 0 }) as TrialTesterEntity;

let position = 0;
const run = (over: Partial<TrialRunEntity> & { axeId: string; label: string }): TrialRunEntity => {
  position += 1;
  return {
    id: `run-${position}`,
    trialId: 't',
    position,
    testerId: 'tom',
    swings: [],
    releaseStep: null,
    keenness: null,
    feel: '',
    notes: '',
    grind: 'FLAT',
    bevelIncludedDeg: 25,
    chiselWidthMm: null,
    axe: { label: over.label },
    ...over,
  } as unknown as TrialRunEntity;
};

const counted = (...depths: number[]) => depths.map((depthMm) => ({ depthMm, opening: false }));

// Invented block: green quaking aspen, 305 mm; reference "Ref"; testers Tom and Tess.
const TRIAL: LoadedTrial = {
  id: 'trial-1',
  speciesId: 'quaking-aspen',
  condition: 'GREEN',
  diameterMm: 305,
  referenceAxeId: 'ref',
  testers: [tester('tom', 'Tom'), tester('tess', 'Tess')],
  runs: [
    // Listed out of recorded order on purpose: the mapping sorts by position.
    run({ axeId: 'b', label: 'B', testerId: 'tess', swings: counted(33, 33), releaseStep: 4, keenness: 'DULL', grind: 'CONVEX', bevelIncludedDeg: 17, position: 3 }),
    run({ axeId: 'ref', label: 'Ref', swings: [{ depthMm: 15, opening: true }, ...counted(30, 32, 28)], releaseStep: 3, keenness: 'WORKING', position: 1 }),
    run({ axeId: 'a', label: 'A', swings: [{ depthMm: 20, opening: true }, ...counted(36, 34, 38)], releaseStep: 2, keenness: 'KEEN', grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05, position: 2 }),
  ],
};

describe('toTrialInput', () => {
  it('turns stored rows into the shared computation input in recorded order', () => {
    const input = toTrialInput(TRIAL);
    expect(input.runs.map((r) => r.axeLabel)).toEqual(['Ref', 'A', 'B']);
    // Stored release step 2 is the shared scale's "release-2"; keenness is lower-case there.
    expect(input.runs[1]).toMatchObject({ release: 'release-2', keenness: 'keen', testerName: 'Tom' });
    expect(input.runs[1]!.head).toEqual({ grind: 'CHISEL', includedDeg: 15, chiselWidthMm: 19.05 });
    // An opening stroke keeps its mark; a counted one carries none.
    expect(input.runs[0]!.swings.slice(0, 2)).toEqual([{ depthMm: 15, opening: true }, { depthMm: 30 }]);
  });
});

describe('computeTrial', () => {
  const result = computeTrial(TRIAL);
  const row = (label: string) => result.ranking.find((r) => r.axeLabel === label)!;

  it('ranks releasing axes before a binding one and says so in GraphQL flags', () => {
    // Hand-worked: Ref 30, 32, 28 → 30.0; A 36, 34, 38 → 36.0 (release 2 binds); B 33, 33 → 33.0.
    // By depth A 1st, B 2nd, Ref 3rd; the verdict moves binding A after B and Ref → B 1, Ref 2, A 3.
    expect(result.ranking.map((r) => [r.axeLabel, r.depthPlace, r.verdictPlace])).toEqual([
      ['B', 2, 1],
      ['Ref', 3, 2],
      ['A', 1, 3],
    ]);
    expect(row('A').flags).toEqual([TrialFlagEnum.PLACED_AFTER_RELEASING_AXES, TrialFlagEnum.BINDS]);
    // B: keenness DULL, and two counted swings is below the three the verdict wants.
    expect(row('B').flags).toEqual([TrialFlagEnum.EDGE_DULL, TrialFlagEnum.FEW_SWINGS]);
  });

  it('maps depths, ratios, release steps and heads back to the API shape', () => {
    // Hand-worked: A 36 ÷ 30 = 1.2; B 33 ÷ 30 = 1.1; sample sd of 36, 34, 38 = sqrt((0+4+4)/2) = 2.
    expect(row('A')).toMatchObject({ meanMm: 36, ratioToReference: 1.2, sdMm: 2, counted: 3, openingExcluded: 1, releaseStep: 2, keenness: 'KEEN' });
    expect(row('B').ratioToReference).toBeCloseTo(1.1, 12);
    expect(row('A').head).toEqual({ grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05 });
    // Tess swung B but not the reference.
    expect(row('B').testersWithoutReference).toEqual(['Tess']);
    expect(row('B').sameTesterRatio).toBeNull();
  });

  it('writes the plain recommendation for the wood', () => {
    expect(result.recommendation).toBe(
      'For green quaking aspen: 1st B (33.0 mm a swing, 1.10× the reference); 2nd Ref (30.0 mm a swing, reference); ' +
        '3rd A (36.0 mm a swing, 1.20× the reference). A cut deeper but binds, so placed after the axes that release. ' +
        'B: swung by someone who did not swing the reference axe; read the ratio with care.',
    );
  });

  it('answers an empty trial with no rows and a sentence that says so', () => {
    const empty = computeTrial({ ...TRIAL, runs: [] });
    expect(empty.ranking).toEqual([]);
    expect(empty.recommendation).toBe('For green quaking aspen: no axe has been swung yet.');
  });

  it('gives no tester-effect ratio when the shallowest tester cut nothing', () => {
    const zero = computeTrial({
      ...TRIAL,
      runs: [run({ axeId: 'ref', label: 'Ref', swings: counted(30) }), run({ axeId: 'ref', label: 'Ref', testerId: 'tess', swings: counted(0) })],
    });
    // Hand-worked: Tom 30 ÷ Tess 0 has no finite value; the API prints null rather than Infinity.
    expect(zero.testerEffects[0]!.highToLowRatio).toBeNull();
  });
});

describe('block words', () => {
  it('says the wood as people do', () => {
    expect(woodLabel('eastern-white-pine', 'SEASONED')).toBe('seasoned eastern white pine');
  });

  it('warns on a frozen block or air at or below freezing, not above', () => {
    expect(frozenWarning('FROZEN', null)).toBe(true);
    expect(frozenWarning('GREEN', 0)).toBe(true);
    expect(frozenWarning('GREEN', -4)).toBe(true);
    expect(frozenWarning('GREEN', 0.5)).toBe(false);
    expect(frozenWarning('DRY', null)).toBe(false);
  });
});
