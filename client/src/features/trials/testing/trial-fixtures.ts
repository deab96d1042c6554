import type { Trial, TrialSetup } from '../api/types.js';
import type { TrialDraft } from '../lib/trial-draft.js';

// Invented club, axes and testers for component tests.
export const CLUB_ID = '0b6f7c1e-1111-4111-8111-111111111111';
export const REF_AXE = 'a0000000-0000-4000-8000-000000000001';
export const CHISEL_AXE = 'a0000000-0000-4000-8000-000000000002';
export const LOOSE_AXE = 'a0000000-0000-4000-8000-000000000003';
export const TESTER = 'b0000000-0000-4000-8000-000000000001';

export const testSetup: TrialSetup = {
  clubId: CLUB_ID,
  clubName: 'Hollow Pine Woodsmen',
  axes: [
    { id: REF_AXE, label: 'Old Tom', grind: 'FLAT', bevelIncludedDeg: 25, chiselWidthMm: null, status: 'READY', usable: true },
    { id: CHISEL_AXE, label: 'Kestrel', grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05, status: 'READY', usable: true },
    { id: LOOSE_AXE, label: 'Rattle', grind: 'FLAT', bevelIncludedDeg: 22, chiselWidthMm: null, status: 'HEAD_LOOSE', usable: false },
  ],
  athletes: [{ id: 'c0000000-0000-4000-8000-000000000001', name: 'Tove Ashgrove' }],
};

/** A draft with the block filled in and one tester, no axes yet. */
export function completeDraft(over: Partial<TrialDraft> = {}): TrialDraft {
  return {
    id: 'd0000000-0000-4000-8000-000000000001',
    clubId: CLUB_ID,
    baseVersion: null,
    saveToken: 'token-1',
    unansweredToken: null,
    testedOn: '2026-10-03',
    speciesId: 'quaking-aspen',
    diameterText: '12',
    diameterUnit: 'in',
    condition: 'GREEN',
    knots: '',
    faceUsed: '',
    airTempText: '',
    referenceAxeId: REF_AXE,
    notes: '',
    testers: [{ id: TESTER, athleteId: null, name: 'Wren Visitor' }],
    runs: [],
    sync: 'unsent',
    problem: null,
    changedAt: '2026-10-03T10:00:00.000Z',
    sentAt: null,
    ...over,
  };
}

/** A saved trial: Kestrel first, Old Tom the reference; Kestrel swung by a second tester too. */
export function testTrial(over: Partial<Trial> = {}): Trial {
  return {
    id: 'd0000000-0000-4000-8000-000000000001',
    testedOn: '2026-10-03',
    speciesId: 'quaking-aspen',
    speciesName: 'quaking aspen',
    condition: 'GREEN',
    diameterMm: 304.8,
    referenceAxeLabel: 'Old Tom',
    axeCount: 2,
    leaderLabel: 'Kestrel',
    published: false,
    clubId: CLUB_ID,
    clubName: 'Hollow Pine Woodsmen',
    woodLabel: 'green quaking aspen',
    knots: '',
    faceUsed: 'north face',
    airTempC: 7,
    frozenWarning: false,
    referenceAxeId: REF_AXE,
    notes: '',
    version: 1,
    canEdit: true,
    updatedAt: '2026-10-03T10:00:00.000Z',
    testers: [{ id: TESTER, athleteId: null, name: 'Wren Visitor' }],
    runs: [
      { id: 'r1', axeId: REF_AXE, axeLabel: 'Old Tom', testerId: TESTER, testerName: 'Wren Visitor', swings: [{ depthMm: 30, opening: false }], releaseStep: 3, keenness: 'WORKING', feel: '', notes: '', head: { grind: 'FLAT', bevelIncludedDeg: 25, chiselWidthMm: null } },
      { id: 'r2', axeId: CHISEL_AXE, axeLabel: 'Kestrel', testerId: TESTER, testerName: 'Wren Visitor', swings: [{ depthMm: 35.2, opening: false }], releaseStep: 4, keenness: 'KEEN', feel: '', notes: '', head: { grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05 } },
    ],
    ranking: [
      { axeId: CHISEL_AXE, axeLabel: 'Kestrel', isReference: false, head: { grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05 }, testers: ['Wren Visitor'], counted: 5, openingExcluded: 1, meanMm: 35.2, sdMm: 1.9, ratioToReference: 1.1733, sameTesterRatio: 1.1733, testersWithoutReference: [], releaseStep: 4, keenness: 'KEEN', depthPlace: 1, verdictPlace: 1, flags: [], notes: [] },
      { axeId: REF_AXE, axeLabel: 'Old Tom', isReference: true, head: { grind: 'FLAT', bevelIncludedDeg: 25, chiselWidthMm: null }, testers: ['Wren Visitor'], counted: 2, openingExcluded: 0, meanMm: 30, sdMm: 1.4, ratioToReference: 1, sameTesterRatio: 1, testersWithoutReference: [], releaseStep: 1, keenness: 'WORKING', depthPlace: 2, verdictPlace: 2, flags: ['BINDS', 'FEW_SWINGS'], notes: [] },
    ],
    testerEffects: [],
    recommendation: 'For green quaking aspen: 1st Kestrel (35.2 mm a swing, 1.17× the reference); 2nd Old Tom (30.0 mm a swing, reference).',
    finding: null,
    ...over,
  };
}
