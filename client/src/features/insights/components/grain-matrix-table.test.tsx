import { describe, expect, it, jest } from '@jest/globals';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';

import type { GrainCell, GrainMap } from '../api/types.js';
import { GrainMatrixTable } from './grain-matrix-table.js';

const cell = (over: Partial<GrainCell>): GrainCell => ({
  key: 'k', speciesId: 'quaking-aspen', grind: 'chisel', condition: null, results: 40, athletes: 8, medianHundredths: 3000,
  lowHundredths: 2900, highHundredths: 3100, effect: 0.96, effectLow: 0.95, effectHigh: 0.97, effectResults: 40, effectAthletes: 8,
  clearDifference: true, label: 'strong', ...over,
});

const map = {
  grinds: ['convex', 'chisel', 'flat'],
  cells: [cell({}), cell({ key: 'k2', grind: 'convex', results: 6, athletes: 2, effect: 1.01, clearDifference: false, label: 'not-enough-data' })],
  species: [{ speciesId: 'quaking-aspen', name: 'Quaking aspen', sentence: '', results: 46, specificGravityGreen: null, specificGravityDry: null, hardnessLbfGreen: null, hardnessLbfDry: null, source: null }],
  settings: { minResults: 10, minAthletes: 3 },
} as unknown as GrainMap;

describe('GrainMatrixTable', () => {
  it('prints n and the label in every cell and says why an empty cell is empty', () => {
    render(<GrainMatrixTable map={map} onOpen={() => undefined} />);
    // hand-worked: effect 0.96 with a clear difference reads "4 % faster"
    expect(screen.getByRole('button', { name: 'Quaking aspen, chisel: 4 % faster, n = 40, strong' })).toBeTruthy();
    // below the 10-result threshold no effect is claimed
    expect(screen.getByRole('button', { name: 'Quaking aspen, convex: needs 10+ results from 3+ athletes, n = 6, not enough data' })).toBeTruthy();
    expect(screen.getByText('No results with this grind on this wood yet')).toBeTruthy();
  });

  it('opens the cell that was pressed', async () => {
    const onOpen = jest.fn();
    render(<GrainMatrixTable map={map} onOpen={onOpen} />);
    await userEvent.click(screen.getByRole('button', { name: /chisel/ }));
    expect(onOpen).toHaveBeenCalledWith('quaking-aspen', 'chisel');
  });
});
