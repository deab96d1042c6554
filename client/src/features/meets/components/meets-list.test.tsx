import { describe, expect, it } from '@jest/globals';
import { screen } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { setViewport } from '../../../../test/viewport.js';
import { meetsDocuments } from '../api/meets-documents.js';
import type { MeetsFilter } from '../api/types.js';
import { testClubs, testMeet, testSeason } from '../testing/meet-fixtures.js';
import { MeetsList } from './meets-list.js';

const optionsMock = {
  request: { query: meetsDocuments.leagueOptions },
  result: { data: { seasons: [testSeason], clubs: testClubs } },
};
const noMeets = (filter: MeetsFilter) => ({
  request: { query: meetsDocuments.meets, variables: { filter } },
  result: { data: { meets: [] } },
});

describe('MeetsList', () => {
  it('tells a visitor no meets are announced yet and offers the past meets', async () => {
    const { user, router } = renderWithProviders({
      element: <MeetsList canRunMeets={false} />,
      path: '/meets',
      mocks: [optionsMock, noMeets({ when: 'UPCOMING' }), noMeets({ when: 'PAST' })],
    });
    expect(await screen.findByText(/No upcoming meets have been announced yet/)).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'New meet' })).not.toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'See past meets' }));
    expect(router.state.location.search).toBe('?when=past');
    expect(await screen.findByText(/No meets have taken place yet/)).toBeInTheDocument();
  });

  it('sends an organiser to build the first meet', async () => {
    renderWithProviders({
      element: <MeetsList canRunMeets />,
      path: '/meets',
      mocks: [optionsMock, noMeets({ when: 'UPCOMING' })],
    });
    expect(await screen.findByText(/No upcoming meets yet\. Build the next one/)).toBeInTheDocument();
    // one "New meet" at the top, one in the empty state
    expect(screen.getAllByRole('link', { name: 'New meet' })).toHaveLength(2);
  });

  it('reads its filters from the address and offers to clear them when nothing matches', async () => {
    const { user, router } = renderWithProviders({
      element: <MeetsList canRunMeets={false} />,
      path: '/meets?club=club-hollow&status=OPEN',
      mocks: [optionsMock, noMeets({ when: 'UPCOMING', clubId: 'club-hollow', status: 'OPEN' }), noMeets({ when: 'UPCOMING' })],
    });
    expect(await screen.findByText('No upcoming meets match these filters.')).toBeInTheDocument();
    await user.click(screen.getAllByRole('button', { name: 'Clear filters' })[0]!);
    expect(router.state.location.search).toBe('');
    expect(await screen.findByText(/No upcoming meets have been announced yet/)).toBeInTheDocument();
  });

  it('lists meets as cards on a phone, each naming its status in our words and the entry deadline', async () => {
    setViewport({ width: 390 });
    const { events: _events, canManage: _canManage, enterableClubIds: _clubs, ...summary } = testMeet();
    renderWithProviders({
      element: <MeetsList canRunMeets={false} />,
      path: '/meets',
      mocks: [
        optionsMock,
        { request: { query: meetsDocuments.meets, variables: { filter: { when: 'UPCOMING' } } }, result: { data: { meets: [{ ...summary, __typename: 'Meet' }] } } },
      ],
    });
    const card = await screen.findByRole('link', { name: /Hollow Pine Thaw Chop/ });
    expect(card).toHaveAttribute('href', '/meets/meet-1');
    // MEET_STATUS_LABELS.OPEN (shared/src/league/meet-status.ts)
    expect(card).toHaveTextContent('Taking entries');
    // hand-worked: 13 March 2027 is a Saturday
    expect(card).toHaveTextContent('Sat 13 Mar 2027 · Hollow Pine woodlot');
    expect(card).toHaveTextContent('Entries close Wed 10 Mar 2027');
  });
});
