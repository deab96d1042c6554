import { describe, expect, it, jest } from '@jest/globals';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';

import { EndgrainThemeProvider } from '../../../../app/theme/endgrain-theme-provider.js';
import type { TrialSwing, UnitPreference } from '../../api/types.js';
import { SwingPad } from './swing-pad.js';

function Harness({ units, onSwings }: { units: UnitPreference; onSwings: (s: TrialSwing[]) => void }) {
  const [swings, setSwings] = useState<TrialSwing[]>([]);
  return (
    <EndgrainThemeProvider>
      <SwingPad
        swings={swings}
        units={units}
        onChange={(next) => {
          setSwings(next);
          onSwings(next);
        }}
      />
    </EndgrainThemeProvider>
  );
}

describe('SwingPad', () => {
  it('marks the first stroke as opening and leaves it out of the running figure', async () => {
    const user = userEvent.setup();
    const onSwings = jest.fn<(s: TrialSwing[]) => void>();
    render(<Harness units="METRIC" onSwings={onSwings} />);
    const depth = screen.getByLabelText('Depth of swing 1');
    expect(depth).toHaveAttribute('inputmode', 'decimal');
    expect(screen.getByLabelText('Opening stroke (left out of the figures)')).toBeChecked();
    await user.type(depth, '18');
    await user.click(screen.getByRole('button', { name: 'Add swing' }));
    for (const d of ['30', '28', '32']) {
      await user.type(screen.getByLabelText(/^Depth of swing \d$/), `${d}{Enter}`);
    }
    // Hand-worked: 18 is the opening stroke; 30, 28, 32 → 90 ÷ 3 = 30 mm.
    expect(screen.getByText('3 counted, 1 opening left out · 30 mm a swing')).toBeInTheDocument();
    expect(onSwings.mock.calls.at(-1)![0]).toEqual([
      { depthMm: 18, opening: true },
      { depthMm: 30, opening: false },
      { depthMm: 28, opening: false },
      { depthMm: 32, opening: false },
    ]);
  });

  it('takes inches and keeps millimetres, and says what it could not read', async () => {
    const user = userEvent.setup();
    const onSwings = jest.fn<(s: TrialSwing[]) => void>();
    render(<Harness units="IMPERIAL" onSwings={onSwings} />);
    await user.click(screen.getByLabelText('Opening stroke (left out of the figures)'));
    await user.type(screen.getByLabelText('Depth of swing 1'), 'deep{Enter}');
    expect(screen.getByText(/Type the depth of the swing in inches/)).toBeInTheDocument();
    await user.clear(screen.getByLabelText('Depth of swing 1'));
    await user.type(screen.getByLabelText('Depth of swing 1'), '1 1/2{Enter}');
    // 1.5 in × 25.4 = 38.1 mm exactly (NIST SP 811), shown back as 1.5 in.
    expect(onSwings.mock.calls.at(-1)![0]).toEqual([{ depthMm: 38.1, opening: false }]);
    expect(screen.getByText('1 counted · 1.5 in a swing')).toBeInTheDocument();
  });
});
