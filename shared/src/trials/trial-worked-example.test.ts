import { describe, expect, it } from '@jest/globals';

import { recommendationSentence } from './recommendation-sentence.js';
import { summariseTrial } from './summarise-trial.js';
import { testerEffect } from './tester-effect.js';
import { trialInputSchema, type TrialInput, type TrialSwing } from './trial-types.js';
import { trialVerdict } from './trial-verdict.js';

const swings = (opening: number[], counted: number[]): TrialSwing[] => [
  ...opening.map((depthMm) => ({ depthMm, opening: true })),
  ...counted.map((depthMm) => ({ depthMm })),
];

// Invented block: green quaking aspen, 300 mm; reference axe "Old Tom"; testers Ana and Ben.
const TRIAL: TrialInput = {
  speciesId: 'quaking-aspen',
  condition: 'green',
  diameterMm: 300,
  referenceAxeId: 'old-tom',
  runs: [
    { axeId: 'old-tom', axeLabel: 'Old Tom', testerId: 'ana', testerName: 'Ana', swings: swings([20], [30, 28, 32]), release: 'release-3', keenness: 'keen' },
    { axeId: 'kestrel', axeLabel: 'Kestrel', testerId: 'ana', testerName: 'Ana', swings: swings([18], [33, 35, 34]), release: 'release-4', keenness: 'keen' },
    { axeId: 'kestrel', axeLabel: 'Kestrel', testerId: 'ben', testerName: 'Ben', swings: swings([], [36, 38]), release: 'release-5', keenness: 'keen' },
    { axeId: 'anvil', axeLabel: 'Anvil', testerId: 'ana', testerName: 'Ana', swings: swings([], [38, 36, 40]), release: 'release-1', keenness: 'working' },
    { axeId: 'blue-jay', axeLabel: 'Blue Jay', testerId: 'ana', testerName: 'Ana', swings: swings([], [30, 29, 31]), release: 'release-3', keenness: 'dull' },
  ],
};

describe('a worked trial on green quaking aspen', () => {
  const rows = summariseTrial(trialInputSchema.parse(TRIAL));
  const row = (axeId: string) => rows.find((r) => r.axeId === axeId)!;

  it('pools both testers on an axe and divides by the reference mean', () => {
    // Hand-worked: Old Tom counted 30, 28, 32 → 30.0. Kestrel counted 33, 35, 34 (Ana) + 36, 38 (Ben)
    // = 176/5 = 35.2 → ratio 35.2/30 = 1.17333. Same-tester ratio (Ana only): 34/30 = 1.13333.
    expect(row('old-tom').depth.meanMm).toBe(30);
    expect(row('kestrel').depth.meanMm).toBeCloseTo(35.2, 12);
    expect(row('kestrel').ratioToReference).toBeCloseTo(1.173333, 6);
    expect(row('kestrel').sameTesterRatio).toBeCloseTo(1.133333, 6);
    expect(row('old-tom').ratioToReference).toBe(1);
  });

  it('keeps the worst release and keenness recorded for an axe', () => {
    // Kestrel was rated release-4 (Ana) and release-5 (Ben): the worse, release-4, counts.
    expect(row('kestrel').release).toBe('release-4');
    expect(row('blue-jay').keenness).toBe('dull');
  });

  it('notes when the reference was swung by someone else', () => {
    // Ben swung Kestrel but not Old Tom.
    expect(row('kestrel').testersWithoutReference).toEqual(['Ben']);
    expect(row('kestrel').notes[0]).toMatch(/Swung by Ben, who did not swing the reference axe \(Ana did\)/);
    expect(row('anvil').notes).toEqual([]);
  });

  it('never places the binding axe above one that releases', () => {
    // Hand-worked: by depth Anvil 38.0 (1st), Kestrel 35.2, then Blue Jay and Old Tom both 30.0.
    // Anvil is release-1 (binds): the stated rule moves it after all releasing axes →
    // Kestrel 1st; Blue Jay and Old Tom joint 2nd; Anvil 4th, flagged as moved.
    const verdict = trialVerdict(rows);
    expect(verdict.map((r) => [r.axeLabel, r.depthPlace, r.verdictPlace])).toEqual([
      ['Kestrel', 2, 1],
      ['Blue Jay', 3, 2],
      ['Old Tom', 3, 2],
      ['Anvil', 1, 4],
    ]);
    expect(verdict[3]!.flags).toEqual(['placed-after-releasing-axes', 'binds']);
    expect(verdict[1]!.flags).toEqual(['edge-dull']);
    // Kestrel has five counted swings: not thin.
    expect(verdict[0]!.flags).toEqual([]);
  });

  it('shows how far two testers differ on the same axe', () => {
    // Hand-worked: Kestrel, Ben 37.0 (36, 38) vs Ana 34.0 → 37/34 = 1.088235.
    const [effect, ...others] = testerEffect(TRIAL);
    expect(others).toEqual([]);
    expect(effect!.byTester.map((t) => [t.testerName, t.meanMm])).toEqual([['Ben', 37], ['Ana', 34]]);
    expect(effect!.highToLowRatio).toBeCloseTo(1.088235, 6);
  });

  it('writes the recommendation in plain words', () => {
    expect(recommendationSentence(trialVerdict(rows), 'green quaking aspen')).toBe(
      'For green quaking aspen: 1st Kestrel (35.2 mm a swing, 1.17× the reference); ' +
        'joint 2nd Blue Jay (30.0 mm a swing, 1.00× the reference) and Old Tom (30.0 mm a swing, reference); ' +
        '4th Anvil (38.0 mm a swing, 1.27× the reference). ' +
        'Anvil cut deeper but binds, so placed after the axes that release. ' +
        'Kestrel: swung by someone who did not swing the reference axe; read the ratio with care.',
    );
  });
});
