import { describe, expect, it } from '@jest/globals';
import { GraphQLError } from 'graphql';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { meetsDocuments } from '../api/meets-documents.js';
import { testClubs, testMeet, testMeetEvent } from '../testing/meet-fixtures.js';
import { EntryPickerDialog } from './entry-picker-dialog.js';

const rosterMock = {
  request: { query: meetsDocuments.clubRoster, variables: { id: 'club-hollow' } },
  result: {
    data: {
      club: {
        __typename: 'ClubDetail',
        id: 'club-hollow',
        name: 'Hollow Pine Woodsmen',
        shortName: 'HPINE',
        roster: [
          { __typename: 'Athlete', id: 'ath-rowan', name: 'Rowan Tamarack', divisions: ['MENS'] },
          { __typename: 'Athlete', id: 'ath-ossian', name: 'Ossian Birchwell', divisions: ['MENS', 'MIXED'] },
          { __typename: 'Athlete', id: 'ath-wren', name: 'Wren Ashgrove', divisions: ['WOMENS'] },
        ],
      },
    },
  },
};
const enterInput = { meetEventId: 'event-1', clubId: 'club-hollow', athleteIds: ['ath-rowan'] };
const meetRefetch = { request: { query: meetsDocuments.meet, variables: { id: 'meet-1' } }, result: { data: { meet: testMeet() } } };

function renderPicker(mocks: unknown[]) {
  return renderWithProviders({
    element: <EntryPickerDialog event={testMeetEvent()} clubs={[testClubs[0]!]} onClose={() => undefined} />,
    mocks: [rosterMock, ...(mocks as [])],
  });
}

describe('EntryPickerDialog', () => {
  it("shows the server's rule message beside the athlete list", async () => {
    // the wording comes from shared/src/league/check-entry.ts via the server
    const message = "Rowan Tamarack has reached this meet's limit of 2 events.";
    const { user } = renderPicker([
      {
        request: { query: meetsDocuments.enterMeetEvent, variables: { input: enterInput } },
        result: { errors: [new GraphQLError(message, { extensions: { code: 'BAD_USER_INPUT', field: 'athleteIds' } })] },
      },
    ]);
    const list = await screen.findByRole('group', { name: 'Athletes of Hollow Pine Woodsmen' });
    await user.click(within(list).getByRole('checkbox', { name: 'Rowan Tamarack' }));
    await user.click(screen.getByRole('button', { name: 'Enter' }));

    const alert = await within(list).findByRole('alert');
    expect(alert).toHaveTextContent(message);
  });

  it('puts a refusal that names no athlete field at the top of the dialog', async () => {
    const message = 'The entry deadline has passed; ask the organiser.';
    const { user } = renderPicker([
      {
        request: { query: meetsDocuments.enterMeetEvent, variables: { input: enterInput } },
        result: { errors: [new GraphQLError(message, { extensions: { code: 'BAD_USER_INPUT', field: 'meetEventId' } })] },
      },
    ]);
    await user.click(await screen.findByRole('checkbox', { name: 'Rowan Tamarack' }));
    await user.click(screen.getByRole('button', { name: 'Enter' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(message);
  });

  it('lists only athletes of the event division and asks for a pick before sending', async () => {
    const { user } = renderPicker([]);
    await screen.findByRole('checkbox', { name: 'Rowan Tamarack' });
    expect(screen.queryByRole('checkbox', { name: 'Wren Ashgrove' })).not.toBeInTheDocument();
    expect(screen.getByText(/1 more athlete is on the roster but not in the Men's division/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Enter' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Pick one athlete.');
  });

  it('enters the athlete, says so and stays open for the next one', async () => {
    const { user } = renderPicker([
      {
        request: { query: meetsDocuments.enterMeetEvent, variables: { input: enterInput } },
        result: { data: { enterMeetEvent: { __typename: 'Entry', id: 'entry-9', label: 'Rowan Tamarack' } } },
      },
      meetRefetch,
    ]);
    await user.click(await screen.findByRole('checkbox', { name: 'Rowan Tamarack' }));
    await user.click(screen.getByRole('button', { name: 'Enter' }));
    expect(await screen.findByRole('status')).toHaveTextContent('Entered: Rowan Tamarack.');
    expect(screen.getByRole('checkbox', { name: 'Rowan Tamarack' })).not.toBeChecked();
  });

  it('offers a name filter when the division has more than twelve athletes', async () => {
    const many = Array.from({ length: 13 }, (_, i) => ({ __typename: 'Athlete', id: `ath-${i}`, name: `Sawyer ${String.fromCharCode(65 + i)}lder`, divisions: ['MENS'] }));
    const { user } = renderWithProviders({
      element: <EntryPickerDialog event={testMeetEvent()} clubs={[testClubs[0]!]} onClose={() => undefined} />,
      mocks: [{ ...rosterMock, result: { data: { club: { ...rosterMock.result.data.club, roster: many } } } }],
    });
    await user.type(await screen.findByRole('searchbox', { name: 'Find an athlete' }), 'cl');
    const list = screen.getByRole('group', { name: 'Athletes of Hollow Pine Woodsmen' });
    // hand-worked: only "Sawyer Clder" (i = 2, letter C) contains "cl"
    expect(within(list).getAllByRole('checkbox').map((box) => box.closest('label')?.textContent)).toEqual(['Sawyer Clder']);
    await user.clear(screen.getByRole('searchbox', { name: 'Find an athlete' }));
    await user.type(screen.getByRole('searchbox', { name: 'Find an athlete' }), 'zz');
    expect(screen.getByText('Nobody in this division has "zz" in their name.')).toBeInTheDocument();
  });
});
