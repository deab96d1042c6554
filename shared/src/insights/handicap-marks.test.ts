import { describe, expect, it } from '@jest/globals';

import { handicapMarks, type HandicapAthlete } from './handicap-marks.js';

// Invented athletes; handicap block 300 mm, area scaling, newest 3 times count.
const ATHLETES: HandicapAthlete[] = [
  {
    athleteId: 'ana',
    history: [
      { hundredths: 4000, diameterMm: 300, date: '2025-04-01' },
      { hundredths: 4200, diameterMm: 300, date: '2025-04-15' },
      { hundredths: 4100, diameterMm: 300, date: '2025-05-01' },
    ],
  },
  {
    athleteId: 'ben',
    history: [
      { hundredths: 5000, diameterMm: 300, date: '2024-09-01' },
      { hundredths: 4900, diameterMm: 350, date: '2025-03-01' },
      { hundredths: 3500, diameterMm: 300, date: '2025-04-01' },
      { hundredths: 3700, diameterMm: 300, date: '2025-05-01' },
    ],
  },
  { athleteId: 'cal', history: [{ hundredths: 5000, diameterMm: 300, date: '2025-05-01' }] },
  { athleteId: 'dee', history: [] },
];

describe('handicapMarks', () => {
  const { marks, slowestAthleteId, convention } = handicapMarks(ATHLETES, { blockDiameterMm: 300, lastK: 3 });
  const mark = (id: string) => marks.find((m) => m.athleteId === id)!;

  it('expects each athlete’s median of their newest times on this block size', () => {
    // Hand-worked: Ana 4000, 4200, 4100 → 4100. Ben's newest three: 4900 on 350 mm → 4900 × (300/350)²
    // = 3600, 3500, 3700 → 3600 (his 2024 time of 5000 is older than the newest three). Cal 5000.
    expect(mark('ana').expectedHundredths).toBe(4100);
    expect(mark('ben').expectedHundredths).toBeCloseTo(3600, 9);
    expect(mark('ben').used.map((u) => u.date)).toEqual(['2025-05-01', '2025-04-01', '2025-03-01']);
    expect(mark('cal').expectedHundredths).toBe(5000);
  });

  it('gives the slowest mark 0 and the backmarker the largest mark', () => {
    // Hand-worked: slowest Cal 50.00 s → 0; Ana (5000 − 4100)/100 = 9 s; Ben (5000 − 3600)/100 = 14 s.
    expect(slowestAthleteId).toBe('cal');
    expect([mark('cal').markSeconds, mark('ana').markSeconds, mark('ben').markSeconds]).toEqual([0, 9, 14]);
    expect(convention).toMatch(/backmarker/);
  });

  it('flags thin and missing history for the organiser', () => {
    // Cal has one time (< 3); Dee has none and gets no mark.
    expect(mark('cal').flags).toEqual(['thin-history']);
    expect(mark('dee')).toMatchObject({ markSeconds: null, expectedHundredths: null, flags: ['no-history'] });
    expect(mark('ana').flags).toEqual([]);
  });

  it('rescales times to a different handicap block and rounds to the step', () => {
    // Hand-worked: on a 330 mm block every expectation × (330/300)² = 1.21: Cal 6050, Ana 4961 →
    // 10.89 s → 11 s to the nearest second; with 5 s steps 10.89 → 10.
    const big = handicapMarks(ATHLETES.slice(0, 3), { blockDiameterMm: 330, lastK: 3 });
    expect(big.marks.find((m) => m.athleteId === 'ana')!.markSeconds).toBe(11);
    const stepped = handicapMarks(ATHLETES.slice(0, 3), { blockDiameterMm: 330, lastK: 3, stepSeconds: 5 });
    expect(stepped.marks.find((m) => m.athleteId === 'ana')!.markSeconds).toBe(10);
  });
});
