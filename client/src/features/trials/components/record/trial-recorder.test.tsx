import { afterEach, beforeEach, describe, expect, it, jest } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../../test/render-with-providers.js';
import { draftStore } from '../../lib/draft-store.js';
import { completeDraft, LOOSE_AXE, testSetup } from '../../testing/trial-fixtures.js';
import { TrialRecorder } from './trial-recorder.js';

describe('TrialRecorder', () => {
  // Beside the block with no signal: nothing is sent, everything is kept on the phone.
  beforeEach(() => {
    jest.spyOn(window.navigator, 'onLine', 'get').mockReturnValue(false);
  });
  afterEach(() => {
    jest.restoreAllMocks();
  });

  it('records an axe beside the block, starting on the reference axe, and keeps it on the phone', async () => {
    const draft = completeDraft();
    const { user } = renderWithProviders({ element: <TrialRecorder initial={draft} setup={testSetup} units="METRIC" /> });
    // The folded block says what it holds.
    expect(screen.getByText('The block: 12 in · Green / wet quaking aspen · 1 tester · reference Old Tom')).toBeInTheDocument();
    expect(screen.getByText('No axe swung yet. Start with the reference axe, then add each axe as it comes off the block.')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Add an axe' }));
    expect(screen.getByRole('button', { name: /^Old Tom · Flat/ })).toHaveAttribute('aria-pressed', 'true');
    // An axe with a loose head is shown but cannot be put on the block.
    expect(screen.getByRole('button', { name: /^Rattle · Flat · 22° · out of use/ })).toBeDisabled();
    await user.click(screen.getByLabelText('Opening stroke (left out of the figures)'));
    for (const d of ['30', '28', '32']) await user.type(screen.getByLabelText(/^Depth of swing \d$/), `${d}{Enter}`);
    await user.click(screen.getByRole('button', { name: '3 · steady' }));
    await user.click(screen.getByRole('button', { name: 'Keen' }));
    await user.click(screen.getByRole('button', { name: 'Save this axe' }));

    const card = screen.getByRole('listitem', { name: 'Old Tom · Wren Visitor' });
    // Hand-worked: 30, 28, 32 → 30 mm a swing.
    expect(within(card).getByText('3 counted · 30 mm a swing')).toBeInTheDocument();
    expect(within(card).getByText('Release: steady · Edge: keen')).toBeInTheDocument();
    expect(screen.getByRole('status')).toHaveTextContent('Saved on this phone · no connection: it is sent when you are back online');
    expect(draftStore.load(draft.id)?.runs).toHaveLength(1);
    expect(draftStore.load(draft.id)?.runs[0]?.axeId).not.toBe(LOOSE_AXE);
  });

  it('asks before it removes an axe and its swings', async () => {
    const draft = completeDraft({ runs: [{ id: 'r1', axeId: testSetup.axes[0]!.id, testerId: completeDraft().testers[0]!.id, swings: [{ depthMm: 30, opening: false }], releaseStep: 3, keenness: null, feel: '', notes: '' }] });
    const { user } = renderWithProviders({ element: <TrialRecorder initial={draft} setup={testSetup} units="METRIC" /> });
    await user.click(screen.getByRole('button', { name: 'Remove Old Tom · Wren Visitor' }));
    await user.click(screen.getByRole('button', { name: 'Keep' }));
    expect(screen.getByRole('listitem', { name: 'Old Tom · Wren Visitor' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Remove Old Tom · Wren Visitor' }));
    await user.click(screen.getByRole('button', { name: 'Remove 1 swings' }));
    expect(screen.queryByRole('listitem', { name: 'Old Tom · Wren Visitor' })).not.toBeInTheDocument();
  });

  it('warns about frozen wood when the air is below freezing', async () => {
    const { user } = renderWithProviders({ element: <TrialRecorder initial={completeDraft({ speciesId: '' })} setup={testSetup} units="METRIC" /> });
    expect(screen.queryByText(/Competition edges are not tested in frozen wood/)).not.toBeInTheDocument();
    await user.type(screen.getByLabelText('Air temperature (°C, optional)'), '2');
    await user.click(screen.getByRole('button', { name: 'Below zero: change the sign' }));
    expect(screen.getByLabelText('Air temperature (°C, optional)')).toHaveValue('-2');
    expect(screen.getByText(/Competition edges are not tested in frozen wood/)).toBeInTheDocument();
  });
});
