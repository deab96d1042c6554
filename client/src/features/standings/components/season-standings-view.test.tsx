import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { standingsDocuments } from '../api/standings-documents.js';
import type { SeasonStandings } from '../api/types.js';
import { SeasonStandingsView } from './season-standings-view.js';

const TIE_BREAK = "Clubs level on season points are separated by the most event first places across the season's meets, then the most second places, and so on down the places; clubs still level share the place.";

const standings: SeasonStandings = {
  __typename: 'SeasonStandings', seasonId: 'season-1', seasonName: '2026–27', tieBreak: TIE_BREAK, provisional: false,
  meets: [{ __typename: 'StandingsMeet', id: 'meet-1', name: 'Hollow Pine Fall Chop', startsOn: '2026-10-17' }],
  divisions: [{
    __typename: 'DivisionStanding', division: 'WOMENS', provisional: false,
    clubs: [
      { __typename: 'ClubStanding', clubId: 'c1', clubName: 'Hollow Pine Woodsmen', clubShortName: 'HPINE', points: 18, place: 1, tied: false, placeCounts: [2, 1], meets: 1 },
      { __typename: 'ClubStanding', clubId: 'c2', clubName: 'Tamarack Ridge Axe Club', clubShortName: 'TRIDGE', points: 18, place: 1, tied: true, placeCounts: [2, 1], meets: 1 },
    ],
  }],
};

const mocks = [
  { request: { query: standingsDocuments.seasons }, result: { data: { seasons: [{ __typename: 'Season', id: 'season-1', name: '2026–27', isCurrent: true }] } } },
  { request: { query: standingsDocuments.seasonStandings, variables: { seasonId: 'season-1' } }, result: { data: { standings } }, maxUsageCount: 3 },
];

describe('SeasonStandingsView', () => {
  it('states the tie-break under the table and marks a shared place', async () => {
    renderWithProviders({ element: <SeasonStandingsView />, path: '/standings?division=womens', mocks });
    const table = await screen.findByRole('table', { name: "Women's standings" });
    expect(within(table).getAllByRole('row')[2]).toHaveTextContent('1=Tamarack Ridge Axe Club18');
    expect(screen.getByText(TIE_BREAK)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Hollow Pine Fall Chop' })).toHaveAttribute('href', '/results/meets/meet-1');
  });

  it('says what to expect when a division has nothing published yet, and keeps the division in the address', async () => {
    const { user, router } = renderWithProviders({ element: <SeasonStandingsView />, path: '/standings?division=womens', mocks });
    await screen.findByRole('table', { name: "Women's standings" });
    await user.click(screen.getByRole('tab', { name: 'Mixed' }));
    expect(router.state.location.search).toBe('?season=season-1&division=mixed');
    expect(await screen.findByText(/No mixed results are published for 2026–27 yet/)).toBeInTheDocument();
  });
});
