import { describe, expect, it } from '@jest/globals';
import { screen } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { GeometryCalculator } from './geometry-calculator.js';

describe('GeometryCalculator', () => {
  it('gives the shoulder thickness of a ¾ in chisel at 15° included in both units', async () => {
    renderWithProviders({ element: <GeometryCalculator units="IMPERIAL" /> });
    // Hand-worked: t = 2 × 0.75 in × tan 7.5° = 1.5 × 0.1316525 = 0.1974787 in → 0.1975 in; × 25.4 = 5.016 mm.
    const result = await screen.findByRole('status', { name: 'Shoulder thickness' });
    expect(result.textContent).toBe('15° included (7.5° per side): thickness at the shoulder = 2 × 0.75 in × tan 7.5° = 5.016 mm = 0.1975 in');
  });

  it('reads a per-side angle as half the included one', async () => {
    const { user } = renderWithProviders({ element: <GeometryCalculator units="METRIC" /> });
    await user.click(await screen.findByRole('button', { name: 'Per side (one face)' }));
    const box = screen.getByLabelText('Per-side angle');
    await user.clear(box);
    await user.type(box, '8');
    // Identity: included = 2 × per-side, so 8° a side is 16° included; t = 2 × 19.05 × tan 8° = 38.1 × 0.1405408 = 5.355 mm.
    expect(screen.getByRole('status', { name: 'Shoulder thickness' }).textContent).toContain('16° included (8° per side)');
    expect(screen.getByRole('status', { name: 'Shoulder thickness' }).textContent).toContain('5.355 mm');
  });

  it('turns a thickness measured behind the edge back into the included angle', async () => {
    const { user } = renderWithProviders({ element: <GeometryCalculator units="METRIC" /> });
    await user.type(await screen.findByLabelText('Thickness'), '5.016');
    await user.type(screen.getByLabelText('Distance behind the edge'), '19.05');
    // Inverse of the worked example: 5.016 ÷ 38.1 = 0.1316535; atan = 7.50008°; × 2 = 15.0002° → "15°" at three decimals.
    expect(screen.getByRole('status', { name: 'Included angle' }).textContent).toBe('Included angle 15°, which is 7.5° per side.');
  });

  it('says so when a face is shorter than half the thickness', async () => {
    const { user } = renderWithProviders({ element: <GeometryCalculator units="METRIC" /> });
    await user.click(await screen.findByRole('button', { name: 'Along the face' }));
    await user.type(screen.getByLabelText('Thickness'), '10');
    await user.type(screen.getByLabelText('Distance behind the edge'), '4');
    expect(screen.getByRole('status', { name: 'Included angle' }).textContent).toMatch(/^Those numbers do not make a bevel/);
  });
});
