import { describe, expect, it } from '@jest/globals';
import { screen } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { trialsDocuments } from '../api/trials-documents.js';
import type { TrialList } from '../api/types.js';
import { draftStore } from '../lib/draft-store.js';
import { CLUB_ID, completeDraft, testTrial } from '../testing/trial-fixtures.js';
import { TrialsList } from './trials-list.js';

const listMock = (list: Partial<TrialList>) => ({
  request: { query: trialsDocuments.trials, variables: { clubId: CLUB_ID } },
  result: { data: { trials: { clubId: CLUB_ID, clubName: 'Hollow Pine Woodsmen', canRecord: false, trials: [], ...list } } },
});

describe('TrialsList', () => {
  it('tells an athlete that trials appear once the coaches record one', async () => {
    renderWithProviders({ element: <TrialsList clubId={CLUB_ID} units="METRIC" />, mocks: [listMock({})] });
    expect(await screen.findByText('No trials yet. When your coaches record one, it shows here with its ranking.')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'New trial' })).not.toBeInTheDocument();
  });

  it('offers a coach a new trial and the drafts this phone has not sent', async () => {
    draftStore.save(completeDraft({ runs: [] }));
    renderWithProviders({ element: <TrialsList clubId={CLUB_ID} units="METRIC" />, mocks: [listMock({ canRecord: true })] });
    expect(await screen.findByRole('link', { name: 'New trial' })).toHaveAttribute('href', `/trials/new?club=${CLUB_ID}`);
    expect(screen.getByText('Kept on this phone, not sent yet')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Trial of 2026-10-03 (0 axe runs)' })).toBeInTheDocument();
  });

  it('lists the trials with their wood, size and the axe that came first', async () => {
    const { axeCount, leaderLabel, id, testedOn, speciesId, speciesName, condition, diameterMm, referenceAxeLabel, published } = testTrial({ published: true });
    renderWithProviders({
      element: <TrialsList clubId={CLUB_ID} units="IMPERIAL" />,
      mocks: [listMock({ trials: [{ id, testedOn, speciesId, speciesName, condition, diameterMm, referenceAxeLabel, axeCount, leaderLabel, published }] })],
    });
    // 304.8 mm = 12 in exactly.
    expect(await screen.findByRole('link', { name: 'Green / wet quaking aspen, 12 in' })).toHaveAttribute('href', `/trials/${id}`);
    expect(screen.getByText('1st: Kestrel')).toBeInTheDocument();
    expect(screen.getByText('Published')).toBeInTheDocument();
  });
});
