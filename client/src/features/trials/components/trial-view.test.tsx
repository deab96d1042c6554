import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { setViewport } from '../../../../test/viewport.js';
import { trialsDocuments } from '../api/trials-documents.js';
import type { Trial } from '../api/types.js';
import { testTrial } from '../testing/trial-fixtures.js';
import { TrialView } from './trial-view.js';

// SafetyNote's title is not its accessible name, so the notes are found by their title text.
const noteTitled = (title: string) => screen.queryAllByRole('note').find((note) => within(note).queryByText(title));

const trialMock = (trial: Trial) => ({ request: { query: trialsDocuments.trial, variables: { id: trial.id } }, result: { data: { trial } } });

describe('TrialView', () => {
  it('shows the recommendation, the ranking with its flags and the cautions, in inches for an imperial reader', async () => {
    setViewport({ width: 1280 });
    const trial = testTrial();
    renderWithProviders({ element: <TrialView trialId={trial.id} units="IMPERIAL" />, mocks: [trialMock(trial)] });
    expect(await screen.findByRole('heading', { name: 'Trial: green quaking aspen', level: 1 })).toBeInTheDocument();
    // 35.2 mm ÷ 25.4 = 1.39 in; 30.0 mm ÷ 25.4 = 1.18 in (NIST SP 811).
    expect(within(screen.getByRole('region', { name: 'Recommendation' })).getByText(/1st Kestrel \(1\.39 in a swing, 1\.17× the reference\); 2nd Old Tom \(1\.18 in a swing/)).toBeInTheDocument();
    const rows = within(screen.getByRole('table', { name: 'Ranking' })).getAllByRole('row');
    expect(within(rows[1]!).getByRole('rowheader')).toHaveTextContent(/^Kestrel/);
    expect(rows[1]).toHaveTextContent('1.17');
    expect(rows[2]).toHaveTextContent('Old Tom (reference)');
    expect(within(rows[2]!).getByText('Binds')).toBeInTheDocument();
    // 12 in block.
    expect(screen.getByText(/12 in green quaking aspen/)).toBeInTheDocument();
    expect(noteTitled('Before anyone swings')).toHaveTextContent('Never test a competition edge in frozen wood.');
    expect(noteTitled('Frozen wood')).toBeUndefined();
    expect(screen.getByRole('button', { name: 'Publish as a finding' })).toBeInTheDocument();
  });

  it('lists the ranking as cards on a phone and hides the coach actions from an athlete', async () => {
    setViewport({ width: 390 });
    const trial = testTrial({ canEdit: false, frozenWarning: true });
    renderWithProviders({ element: <TrialView trialId={trial.id} units="METRIC" />, mocks: [trialMock(trial)] });
    const places = within(await screen.findByRole('list', { name: 'Ranking' })).getAllByRole('listitem');
    expect(places[0]).toHaveTextContent('Kestrel');
    expect(places[0]).toHaveTextContent('35.2 mm a swing · 1.17× the reference');
    expect(screen.queryByRole('button', { name: 'Publish as a finding' })).not.toBeInTheDocument();
    expect(noteTitled('Frozen wood')).toHaveTextContent('Competition edges are not tested in frozen wood');
  });

  it('says what to do next when no axe has been swung', async () => {
    const trial = testTrial({ ranking: [], runs: [], recommendation: 'For green quaking aspen: no axe has been swung yet.' });
    renderWithProviders({ element: <TrialView trialId={trial.id} units="METRIC" />, mocks: [trialMock(trial)] });
    expect(await screen.findByText(/No axe has been swung on this block yet\. Open it on your phone beside the block/)).toBeInTheDocument();
  });
});
