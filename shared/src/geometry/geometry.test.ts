import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { includedFromPerSide, perSideFromIncluded } from './bevel-angle.js';
import { bevelBand } from './bevel-band.js';
import { chiselBand } from './chisel-band.js';
import { includedAngleFromThickness } from './included-angle-from-thickness.js';
import { shoulderThickness } from './shoulder-thickness.js';

const MM_PER_INCH = 25.4; // exact by definition (NIST SP 811, App. B.8)

describe('per-side and included angles', () => {
  it('doubles a per-side angle into the included angle and halves it back', () => {
    // Definition of a symmetric bevel: included = 2 × per-side; 7.5° a side is 15° included.
    expect(includedFromPerSide(7.5)).toBe(15);
    expect(perSideFromIncluded(15)).toBe(7.5);
  });

  it('refuses angles a bit cannot have', () => {
    expect(() => perSideFromIncluded(-1)).toThrow(RangeError);
    expect(() => includedFromPerSide(90)).toThrow(RangeError);
  });
});

describe('shoulderThickness', () => {
  it('gives 0.19748 in at the shoulder of a ¾ in chisel ground at 15° included', () => {
    // Hand-worked: t = 2 × w × tan(included ÷ 2) = 2 × 0.75 in × tan 7.5°
    //   = 1.5 × 0.1316525 = 0.1974787 in; in millimetres 2 × 19.05 × 0.1316525 = 5.016 mm.
    const mm = shoulderThickness({ includedDeg: 15, chiselWidthMm: 0.75 * MM_PER_INCH, measuredAlong: 'back-from-edge' });
    expect(mm).toBeCloseTo(5.016, 3);
    expect(mm / MM_PER_INCH).toBeCloseTo(0.19748, 5);
  });

  it('reads a little thinner when the width was measured along the face', () => {
    // Hand-worked: along a face t = 2 × w × sin 7.5° = 38.1 × 0.1305262 = 4.973 mm.
    const mm = shoulderThickness({ includedDeg: 15, chiselWidthMm: 19.05, measuredAlong: 'along-face' });
    expect(mm).toBeCloseTo(4.973, 3);
  });

  it('is zero for a zero-width chisel', () => {
    // Identity: no bevel width, no thickness gained.
    expect(shoulderThickness({ includedDeg: 16, chiselWidthMm: 0, measuredAlong: 'back-from-edge' })).toBe(0);
  });

  it('agrees with the tangent identity for any angle and width', () => {
    // Identity: (t/2) ÷ w = tan(per-side angle) for a width measured straight back from the edge.
    fc.assert(
      fc.property(fc.double({ min: 1, max: 60, noNaN: true }), fc.double({ min: 0.5, max: 40, noNaN: true }), (deg, w) => {
        const t = shoulderThickness({ includedDeg: deg, chiselWidthMm: w, measuredAlong: 'back-from-edge' });
        return Math.abs(t / 2 / w - Math.tan((perSideFromIncluded(deg) * Math.PI) / 180)) < 1e-12;
      }),
    );
  });
});

describe('includedAngleFromThickness', () => {
  it('inverts the worked example', () => {
    // Inverse of the worked example: 5.016 mm thick 19.05 mm back → 2·atan(5.016/38.1) ≈ 15°.
    expect(includedAngleFromThickness({ thicknessMm: 5.0159, distanceMm: 19.05, measuredAlong: 'back-from-edge' })).toBeCloseTo(15, 3);
  });

  it('round-trips with shoulderThickness in both measuring directions', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 80, noNaN: true }),
        fc.double({ min: 1, max: 50, noNaN: true }),
        fc.constantFrom('back-from-edge' as const, 'along-face' as const),
        (includedDeg, chiselWidthMm, measuredAlong) => {
          const thicknessMm = shoulderThickness({ includedDeg, chiselWidthMm, measuredAlong });
          const back = includedAngleFromThickness({ thicknessMm, distanceMm: chiselWidthMm, measuredAlong });
          return Math.abs(back - includedDeg) < 1e-9;
        },
      ),
    );
  });

  it('refuses a face shorter than half the thickness', () => {
    expect(() => includedAngleFromThickness({ thicknessMm: 10, distanceMm: 4, measuredAlong: 'along-face' })).toThrow(RangeError);
  });
});

describe('Grain Map bands', () => {
  it('puts included angles in two-degree bands across the racing range', () => {
    // Racing bevels run about 13° to 17–18° (a professional series' axe page): bands <14, 14–16, 16–18, >18.
    expect(bevelBand(13).label).toBe('<14°');
    expect(bevelBand(14).label).toBe('14–16°');
    expect(bevelBand(15.99).label).toBe('14–16°');
    expect(bevelBand(16).label).toBe('16–18°');
    expect(bevelBand(18).label).toBe('>18°');
    // A felling axe near 30° (a forest-service axe manual) lands in the open top band.
    expect(bevelBand(30).id).toBe('bevel-over-18');
  });

  it('puts chisel widths in bands on the ½, ¾ and 1 inch marks', () => {
    // Common practice: chisels run from ¼ in (6.35 mm) to over 1 in (25.4 mm).
    expect(chiselBand(6.35).id).toBe('chisel-under-half-inch');
    expect(chiselBand(12.7).id).toBe('chisel-half-to-three-quarter-inch');
    expect(chiselBand(19.05).id).toBe('chisel-three-quarter-to-one-inch');
    expect(chiselBand(25.4).id).toBe('chisel-over-one-inch');
  });

  it('refuses a value no band can hold', () => {
    expect(() => bevelBand(Number.NaN)).toThrow(RangeError);
    expect(() => chiselBand(-2)).toThrow(RangeError);
  });
});
