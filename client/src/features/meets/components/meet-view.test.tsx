import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';
import { GraphQLError } from 'graphql';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { meetsDocuments } from '../api/meets-documents.js';
import type { Entry, MeetDetail } from '../api/types.js';
import { testClubs, testMeet, testMeetEvent, testSeason } from '../testing/meet-fixtures.js';
import { MeetView } from './meet-view.js';

const entry = (id: string, label: string, clubShortName: string, drawPosition: number, heat: number): Entry => ({
  __typename: 'Entry', id, meetEventId: 'event-1', clubId: `club-${clubShortName}`, clubName: clubShortName, clubShortName, label,
  athletes: [{ __typename: 'EntryAthlete', id: `a-${id}`, name: label }], drawPosition, heat,
});

function renderMeet(meet: MeetDetail, extra: unknown[] = [], units: 'METRIC' | 'IMPERIAL' = 'METRIC') {
  return renderWithProviders({
    element: <MeetView meetId="meet-1" units={units} ownClubIds={[]} />,
    mocks: [
      { request: { query: meetsDocuments.meet, variables: { id: 'meet-1' } }, result: { data: { meet } } },
      // coaches' club names come from the league options
      { request: { query: meetsDocuments.leagueOptions }, result: { data: { seasons: [testSeason], clubs: testClubs } } },
      ...(extra as []),
    ],
  });
}

describe('MeetView', () => {
  it('prints the block in the reader units, explains the scoring and shows the meet-day cautions', async () => {
    renderMeet(testMeet({ enterableClubIds: [] }), [], 'IMPERIAL');
    const event = await screen.findByRole('region', { name: "Underhand chop · Men's" });
    // hand-worked: 305 mm ÷ 25.4 = 12.008 in → "12 in"
    expect(within(event).getByText('Block: 12 in Eastern white pine')).toBeInTheDocument();
    expect(screen.getByText(/1st 7, 2nd 6, 3rd 5/)).toBeInTheDocument();
    const safety = screen.getByRole('note');
    expect(safety).toHaveTextContent('Protective footwear and leg protection');
    expect(safety).toHaveTextContent("sanctioning body's rules");
  });

  it('shows a drawn event by heat with the seed that reproduces it', async () => {
    const drawn = testMeetEvent({
      drawSeed: 424242,
      heatSize: 2,
      entries: [entry('e3', 'Wren Ashgrove', 'TRIDGE', 3, 2), entry('e1', 'Rowan Tamarack', 'HPINE', 1, 1), entry('e2', 'Ossian Birchwell', 'HPINE', 2, 1)],
    });
    renderMeet(testMeet({ events: [drawn], enterableClubIds: [] }));
    const heat1 = await screen.findByRole('list', { name: 'Heat 1 of Underhand chop' });
    expect(within(heat1).getAllByRole('listitem').map((item) => item.textContent)).toEqual(['1.Rowan TamarackHPINE', '2.Ossian BirchwellHPINE']);
    expect(screen.getByRole('list', { name: 'Heat 2 of Underhand chop' })).toHaveTextContent('Wren Ashgrove');
    expect(screen.getByText(/Drawn with seed 424242, heats of 2\./)).toBeInTheDocument();
  });

  it('asks the organiser to confirm a status move and keeps the refusal in the dialog', async () => {
    const message = 'Add at least one event before opening the meet for entries.';
    const { user } = renderMeet(testMeet({ status: 'DRAFT', entriesOpen: false, canManage: true, enterableClubIds: [], events: [] }), [
      {
        request: { query: meetsDocuments.setMeetStatus, variables: { id: 'meet-1', status: 'OPEN' } },
        result: { errors: [new GraphQLError(message, { extensions: { code: 'BAD_USER_INPUT', field: 'status' } })] },
      },
    ]);
    expect(await screen.findByText(/No events yet\. Add the first one/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Open for entries' }));
    const dialog = screen.getByRole('dialog', { name: 'Open for entries?' });
    expect(dialog).toHaveTextContent('The meet becomes public');
    await user.click(within(dialog).getByRole('button', { name: 'Open for entries' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent(message);
  });

  it('offers a coach the entry button while entries are open', async () => {
    renderMeet(testMeet());
    expect(await screen.findByRole('button', { name: "Enter athletes in Underhand chop · Men's" })).toBeInTheDocument();
  });

  it('tells a coach the deadline has passed instead of offering entries', async () => {
    renderMeet(testMeet({ entriesOpen: false }));
    expect(await screen.findByText(/The entry deadline has passed/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Enter athletes/ })).not.toBeInTheDocument();
  });

  it('links a coach whose club has entries to that club\'s lineup', async () => {
    const withEntries = testMeetEvent({ entries: [entry('e1', 'Rowan Tamarack', 'HPINE', 1, 1), entry('e2', 'Wren Ashgrove', 'TRIDGE', 2, 1)] });
    renderMeet(testMeet({ events: [withEntries], enterableClubIds: ['club-HPINE'] }));
    const link = await screen.findByRole('link', { name: 'Lineup and axes' });
    // hand-worked: paths.rackLineup.href('meet-1', 'club-HPINE') puts the club in the query string
    expect(link).toHaveAttribute('href', '/rack/lineups/meet-1?club=club-HPINE');
  });

  it('offers no lineup link to a coach whose club has no entries yet', async () => {
    const withEntries = testMeetEvent({ entries: [entry('e2', 'Wren Ashgrove', 'TRIDGE', 2, 1)] });
    renderMeet(testMeet({ events: [withEntries], enterableClubIds: ['club-HPINE'] }));
    expect(await screen.findByText('Wren Ashgrove')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /Lineup and axes/ })).not.toBeInTheDocument();
  });

  it("offers a meet's timekeeper posting until the results are published, and an outsider nothing", async () => {
    const { unmount } = renderMeet(testMeet({ status: 'RUNNING', isTimekeeper: true, enterableClubIds: [] }));
    const nav = await screen.findByRole('navigation', { name: 'Results' });
    expect(within(nav).getByRole('link', { name: 'Post results' })).toHaveAttribute('href', '/results/meets/meet-1/post');
    unmount();
    const published = renderMeet(testMeet({ status: 'PUBLISHED', isTimekeeper: true, enterableClubIds: [] }));
    expect(within(await screen.findByRole('navigation', { name: 'Results' })).queryByRole('link', { name: 'Post results' })).not.toBeInTheDocument();
    published.unmount();
    renderMeet(testMeet({ status: 'RUNNING', enterableClubIds: [] }));
    await screen.findByRole('heading', { level: 1 });
    expect(screen.queryByRole('link', { name: 'Post results' })).not.toBeInTheDocument();
  });

  it('says when an event has its own scoring', async () => {
    renderMeet(testMeet({ events: [testMeetEvent({ scoringScheme: 'FIXED_TABLE', pointsTable: [10, 8, 6] })], enterableClubIds: [] }));
    expect(await screen.findByText(/Own points table: 10-8-6/)).toBeInTheDocument();
  });
});

