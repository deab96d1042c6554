import { describe, expect, it } from '@jest/globals';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { GraphQLError } from 'graphql';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { meetsDocuments } from '../api/meets-documents.js';
import type { MeetInput } from '../api/types.js';
import { fromLocalInput } from '../lib/local-date-time.js';
import { testClubs, testSeason } from '../testing/meet-fixtures.js';
import { MeetBuilder } from './meet-builder.js';

const optionsMock = {
  request: { query: meetsDocuments.leagueOptions },
  result: { data: { seasons: [testSeason], clubs: testClubs } },
};

const input: MeetInput = {
  name: 'Hollow Pine Thaw Chop',
  seasonId: 'season-1',
  hostClubId: 'club-hollow',
  startsOn: '2027-03-13',
  venue: 'Hollow Pine woodlot',
  entryDeadline: fromLocalInput('2027-03-10T18:00')!,
  divisions: ['MENS', 'WOMENS', 'MIXED'],
  scoringScheme: 'FIXED_TABLE',
  pointsTable: [10, 8, 6, 4],
  bestEntryPerClub: false,
  minimumOnePoint: false,
  runOffTopPlaces: 0,
  maxEventsPerAthlete: null,
  requireMixedPairs: true,
  reason: null,
};

async function fillMeet(user: ReturnType<typeof renderWithProviders>['user']) {
  await user.type(await screen.findByLabelText('Meet name'), input.name);
  await user.click(screen.getByRole('combobox', { name: 'Host club' }));
  await user.click(await screen.findByRole('option', { name: 'Hollow Pine Woodsmen' }));
  await waitFor(() => expect(screen.queryByRole('listbox')).not.toBeInTheDocument());
  await user.type(screen.getByLabelText('Venue'), input.venue);
  // date inputs take their value whole, as a date picker gives it
  fireEvent.change(screen.getByLabelText('Meet date'), { target: { value: input.startsOn } });
  fireEvent.change(screen.getByLabelText('Entries close'), { target: { value: '2027-03-10T18:00' } });
}

describe('MeetBuilder', () => {
  it('names every missing field beside it before sending anything', async () => {
    const { user } = renderWithProviders({ element: <MeetBuilder />, mocks: [optionsMock] });
    await user.click(await screen.findByRole('button', { name: 'Create meet' }));
    // wording mirrors the server's (server/src/meets/meets.service.ts)
    expect(await screen.findByText('Meet name is required.')).toBeInTheDocument();
    expect(screen.getByText('Pick the host club.')).toBeInTheDocument();
    expect(screen.getByText('Venue is required.')).toBeInTheDocument();
    expect(screen.getByText('Pick the meet date.')).toBeInTheDocument();
    expect(screen.getByText('Pick the day and time entries close.')).toBeInTheDocument();
    expect(screen.getByLabelText('Meet name')).toHaveAttribute('aria-invalid', 'true');
  });

  it('checks a custom points table and entries that close after the meet day', async () => {
    const { user } = renderWithProviders({ element: <MeetBuilder />, mocks: [optionsMock] });
    await fillMeet(user);
    fireEvent.change(screen.getByLabelText('Entries close'), { target: { value: '2027-03-14T09:00' } });
    await user.click(screen.getByRole('button', { name: 'Custom' }));
    await user.type(screen.getByLabelText('Custom points, first place first'), '10, 8, 9');
    await user.click(screen.getByRole('button', { name: 'Create meet' }));
    expect(await screen.findByText('Place 3 cannot earn more points than place 2.')).toBeInTheDocument();
    expect(screen.getByText('Entries must close on or before the meet day.')).toBeInTheDocument();
  });

  it("puts the server's refusal beside the field it names", async () => {
    const message = 'Venue must be at most 160 characters.';
    const { user } = renderWithProviders({
      element: <MeetBuilder />,
      mocks: [
        optionsMock,
        {
          request: { query: meetsDocuments.createMeet, variables: { input } },
          result: { errors: [new GraphQLError(message, { extensions: { code: 'BAD_USER_INPUT', field: 'venue' } })] },
        },
      ],
    });
    await fillMeet(user);
    await user.click(screen.getByRole('button', { name: 'Custom' }));
    await user.type(screen.getByLabelText('Custom points, first place first'), '10-8-6-4');
    await user.click(screen.getByRole('button', { name: 'Create meet' }));
    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(screen.getByLabelText('Venue')).toHaveAttribute('aria-invalid', 'true');
  });

  it('creates the meet and opens its page to add events', async () => {
    const { user, router } = renderWithProviders({
      element: <MeetBuilder />,
      path: '/meets/new',
      mocks: [
        optionsMock,
        {
          request: { query: meetsDocuments.createMeet, variables: { input: { ...input, pointsTable: [7, 6, 5, 4, 3, 2, 1] } } },
          result: { data: { createMeet: { __typename: 'MeetDetail', id: 'meet-new' } } },
        },
      ],
    });
    await fillMeet(user);
    await user.click(screen.getByRole('button', { name: 'Create meet' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/meets/meet-new'));
  });
});
