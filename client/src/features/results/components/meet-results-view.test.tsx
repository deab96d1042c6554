import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { MeetResults } from '../api/types.js';
import { testEventResults, testMeetResults, testResult } from '../testing/result-fixtures.js';
import { MeetResultsView } from './meet-results-view.js';

const snapshot = (over: Record<string, unknown>) => JSON.stringify({ status: 'FINISHED', finalStatus: 'FINISHED', rawTimes: [4400], penaltyHundredths: 0, place: 2, points: 6, ...over });
const audit = [
  { __typename: 'ResultAudit', id: 'au-2', resultId: 'r-1', entryId: 'e-1', action: 'CORRECTED', reason: 'watch 1 misread at the block', byName: 'Meet Organiser', at: '2026-10-17T15:00:00.000Z', before: snapshot({}), after: snapshot({ rawTimes: [4137], place: 1, points: 7 }) },
  { __typename: 'ResultAudit', id: 'au-1', resultId: 'r-1', entryId: 'e-1', action: 'RECORDED', reason: null, byName: 'Tamsin Ashbrook', at: '2026-10-17T14:00:00.000Z', before: null, after: snapshot({}) },
];

const render = (meet: MeetResults, units: 'METRIC' | 'IMPERIAL' = 'METRIC') =>
  renderWithProviders({
    element: <MeetResultsView meetId="meet-1" units={units} />,
    mocks: [
      { request: { query: resultsDocuments.meetResults, variables: { meetId: 'meet-1' } }, result: { data: { meetResults: meet } } },
      { request: { query: resultsDocuments.resultAudit, variables: { meetId: 'meet-1' } }, result: { data: { resultAudit: audit } } },
    ],
  });

describe('MeetResultsView', () => {
  it('tells a visitor the results are not out yet', async () => {
    render(testMeetResults({ canRecord: false, canPublish: false, events: [] }));
    expect(await screen.findByText(/Results for this meet are not out yet/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Publish results' })).not.toBeInTheDocument();
  });

  it('lists each event with place, athletes, club, time, points, head and block in the reader’s units', async () => {
    const tied = testResult({ id: 'r-2', entryId: 'e-2', label: 'Orla Pinecrest', athletes: [{ id: 'a-2', name: 'Orla Pinecrest' }], tied: true, points: 6.5, place: 1, penaltyHundredths: 200, condition: 'GREEN' });
    render(testMeetResults({ published: true, status: 'PUBLISHED', canRecord: false, canPublish: false, events: [testEventResults({ results: [testResult({ tied: true, points: 6.5 }), tied], waiting: [] })] }), 'IMPERIAL');
    const table = await screen.findByRole('table', { name: "Underhand chop · Men's results" });
    const rows = within(table).getAllByRole('row');
    // Hand-worked: (7 + 6) / 2 = 6.5 each; 6.35 mm = 0.25 in; a 200-hundredth penalty is +2 s.
    expect(rows[1]).toHaveTextContent('1=Ansel Birchfield');
    expect(rows[1]).toHaveTextContent('6.5');
    expect(rows[1]).toHaveTextContent('Convex · 32° included · chisel 0.25 in');
    expect(rows[2]).toHaveTextContent('+2 s');
    expect(rows[2]).toHaveTextContent('green / wet');
    expect(screen.getByText('Eastern white pine, 12 in')).toBeInTheDocument();
  });

  it('offers an organiser posting and publishing once results are in', async () => {
    render(testMeetResults());
    expect(await screen.findByRole('link', { name: 'Post results' })).toHaveAttribute('href', '/results/meets/meet-1/post');
    expect(screen.getByRole('button', { name: 'Publish results' })).toBeInTheDocument();
  });

  it("shows an organiser the change log, and filters it to corrections", async () => {
    const { user } = render(testMeetResults());
    const log = await screen.findByRole('list', { name: 'Changes to these results' });
    const items = within(log).getAllByRole('listitem');
    // Hand-worked from the snapshots: 44.00 → 41.37, 2nd → 1st, 6 → 7 points.
    expect(items[0]).toHaveTextContent('Corrected: Ansel Birchfield, Underhand chop');
    expect(items[0]).toHaveTextContent('reason: watch 1 misread at the block');
    expect(items[0]).toHaveTextContent('watches 44.00 → 41.37; place 2 → 1; points 6 → 7');
    expect(items[1]).toHaveTextContent('Posted: Ansel Birchfield, Underhand chop');
    await user.click(screen.getByRole('switch', { name: 'Corrections only' }));
    expect(within(screen.getByRole('list', { name: 'Changes to these results' })).getAllByRole('listitem')).toHaveLength(1);
  });
});
