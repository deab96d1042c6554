import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { meetsDocuments } from '../api/meets-documents.js';
import { testMeet } from '../testing/meet-fixtures.js';
import { MeetChanges } from './meet-changes.js';

describe('MeetChanges', () => {
  it('lists each scoring change with who, why, and what the meet said before and says now', async () => {
    const change = {
      __typename: 'MeetChange', id: 'c1', summary: 'Scoring changed: sanctioning table for this season', byName: 'Meet Organiser', at: '2026-10-18T09:00:00.000Z',
      before: JSON.stringify({ scoringScheme: 'FIXED_TABLE', pointsTable: [7, 6, 5, 4, 3, 2, 1] }), after: JSON.stringify({ scoringScheme: 'FIXED_TABLE', pointsTable: [5, 4, 3, 2, 1, 0] }),
    };
    renderWithProviders({
      element: <MeetChanges meetId="meet-1" meet={testMeet({ pointsTable: [5, 4, 3, 2, 1, 0] })} />,
      mocks: [{ request: { query: meetsDocuments.meetChanges, variables: { meetId: 'meet-1' } }, result: { data: { meetChanges: [change] } } }],
    });
    const section = await screen.findByRole('region', { name: 'Scoring changes' });
    expect(within(section).getByText('Scoring changed: sanctioning table for this season')).toBeInTheDocument();
    expect(section).toHaveTextContent('Meet Organiser');
    expect(section).toHaveTextContent('Was: Places earn points from a fixed table: 1st 7, 2nd 6');
    expect(section).toHaveTextContent('Now: Places earn points from a fixed table: 1st 5, 2nd 4');
  });
});
