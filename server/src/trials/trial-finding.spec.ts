import { describe, expect, it } from '@jest/globals';

import type { TrialEntity } from './entities/trial.entity.js';
import { bothLengths, trialFinding } from './trial-finding.js';
import { toTrialModel } from './trials.mappers.js';

const counted = (...depths: number[]) => depths.map((depthMm) => ({ depthMm, opening: false }));
const run = (position: number, axeId: string, label: string, swings: { depthMm: number; opening: boolean }[], releaseStep: number, grind: string) => ({
  id: `r${position}`, position, axeId, axe: { label }, testerId: 'tom', swings, releaseStep, keenness: 'KEEN', feel: '', notes: '', grind, bevelIncludedDeg: 15, chiselWidthMm: null,
});

// Invented: Larchmere, seasoned eastern white pine, 305 mm, two axes.
const TRIAL = {
  id: 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa',
  clubId: 'c', club: { name: 'Larchmere College Woodsmen' }, testedOn: '2026-10-03', speciesId: 'eastern-white-pine', condition: 'SEASONED',
  diameterMm: 304.8, knots: 'one pin knot', faceUsed: 'front face', airTempC: 11, referenceAxeId: 'p4', referenceAxe: { label: 'Practice 4' },
  notes: '', version: 1, updatedAt: new Date('2026-10-03T12:00:00Z'),
  testers: [{ id: 'tom', name: 'Tom Ashgrove', athleteId: null, position: 0 }],
  runs: [run(1, 'p4', 'Practice 4', counted(27, 27, 27), 3, 'FLAT'), run(2, 'r1', 'Race 1', counted(36, 36, 36), 5, 'COMPOUND')],
} as unknown as TrialEntity;

describe('trialFinding', () => {
  const draft = trialFinding(toTrialModel(TRIAL, { canEdit: true, summary: null }));

  it('titles and tags the note by wood and the grinds on the block', () => {
    expect(draft.title).toBe('Trial: seasoned eastern white pine, 2026-10-03');
    expect(draft.grinds).toEqual(['COMPOUND', 'FLAT']);
    expect(draft.condition).toBe('SEASONED');
    // 304.8 mm = 12 in exactly (NIST SP 811, App. B.8).
    expect(draft.summary).toBe('Larchmere College Woodsmen tested 2 axes on a 304.8 mm (12 in) seasoned eastern white pine block; Race 1 came first.');
  });

  it('writes the verdict as a table in both unit systems, with a link back and the cautions', () => {
    // Hand-worked: Race 1 36 ÷ Practice 4 27 = 1.333… → "1.33×"; 36 mm ÷ 25.4 = 1.417 in → "1.42 in".
    expect(draft.bodyMarkdown).toContain('| 1 | Race 1 | compound, 15° included | 36 mm (1.42 in) over 3 swings | 1.33× | springs out |   |');
    expect(draft.bodyMarkdown).toContain('| 2 | Practice 4 | flat, 15° included | 27 mm (1.06 in) over 3 swings | reference | steady |   |');
    expect(draft.bodyMarkdown).toContain('Block: 304.8 mm (12 in) seasoned eastern white pine; knots: one pin knot; face used: front face; air 11 °C.');
    expect(draft.bodyMarkdown).toContain('[The trial in Endgrain](/trials/aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa)');
    expect(draft.bodyMarkdown).toContain('- Never test a competition edge in frozen wood.');
  });

  it('prints lengths in millimetres with inches beside them', () => {
    // 25.4 mm = 1 in exactly.
    expect(bothLengths(25.4)).toBe('25.4 mm (1 in)');
  });
});
