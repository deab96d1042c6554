import { describe, expect, it } from '@jest/globals';
import { screen, waitFor, within } from '@testing-library/react';
import { GraphQLError } from 'graphql';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { resultsDocuments } from '../api/results-documents.js';
import { testEventResults, testMeetResults, testResult } from '../testing/result-fixtures.js';
import { ResultsEntryTable } from './results-entry-table.js';

const rackMock = (clubId: string) => ({
  request: { query: resultsDocuments.clubAxes, variables: { clubId } },
  result: { data: { rack: { __typename: 'Rack', clubId, axes: [] } } },
  maxUsageCount: 10,
});
const refetchMock = { request: { query: resultsDocuments.meetResults, variables: { meetId: 'meet-1' } }, result: { data: { meetResults: testMeetResults() } }, maxUsageCount: 5 };

function renderTable(mocks: unknown[] = []) {
  return renderWithProviders({
    element: <ResultsEntryTable event={testEventResults()} units="METRIC" published={false} />,
    mocks: [rackMock('club-hollow'), rackMock('club-tamarack'), refetchMock, ...(mocks as [])],
  });
}

describe('ResultsEntryTable', () => {
  it('saves a row on Enter and moves to the same watch of the next entry', async () => {
    const input = { entryId: 'e-2', status: 'FINISHED', times: ['40.05'], score: null, penaltySeconds: 0, dqReason: null, axeId: null, axeLabel: null, grind: null, bevelIncludedDeg: null, chiselWidthMm: null, condition: null };
    const saved = testEventResults({ results: [testResult({ entryId: 'e-2', id: 'r-2', label: 'Orla Pinecrest', rawTimes: [4005], totalHundredths: 4005, place: 1 }), testResult({ place: 2, points: 6 })] });
    let called = false;
    const { user } = renderTable([{ request: { query: resultsDocuments.recordResult, variables: { input } }, result: () => { called = true; return { data: { recordResult: saved } }; } }]);
    const watch = await screen.findByLabelText('Watch 1 for Orla Pinecrest');
    await user.type(watch, '40.05{Enter}');
    expect(screen.getByLabelText('Watch 1 for Tam Quillan')).toHaveFocus();
    await waitFor(() => expect(called).toBe(true));
  });

  it('names a bad time beside its cell and sends nothing', async () => {
    const { user } = renderTable();
    await user.type(await screen.findByLabelText('Watch 1 for Orla Pinecrest'), '1:5.3');
    await user.click(screen.getByRole('button', { name: 'Save the result of Orla Pinecrest' }));
    const row = screen.getByRole('group', { name: 'Result of Orla Pinecrest' });
    expect(within(row).getByText('"1:5.3" is not m:ss.hh')).toBeInTheDocument();
    expect(within(row).getByRole('alert')).toHaveTextContent('Fix the marked cells, then save again.');
  });

  it("shows the server's refusal on the row", async () => {
    const input = { entryId: 'e-3', status: 'SCRATCH', times: [], score: null, penaltySeconds: 0, dqReason: null, axeId: null, axeLabel: null, grind: null, bevelIncludedDeg: null, chiselWidthMm: null, condition: null };
    const { user } = renderTable([{ request: { query: resultsDocuments.recordResult, variables: { input } }, result: { errors: [new GraphQLError('Results can be posted once the meet has closed its entries.', { extensions: { code: 'BAD_USER_INPUT', field: 'entryId' } })] } }]);
    await user.selectOptions(await screen.findByLabelText('Status for Tam Quillan'), 'SCRATCH');
    await user.click(screen.getByRole('button', { name: 'Save the result of Tam Quillan' }));
    const row = screen.getByRole('group', { name: 'Result of Tam Quillan' });
    expect(await within(row).findByRole('alert')).toHaveTextContent('Results can be posted once the meet has closed its entries.');
  });

  it('shows what a saved result earned, computed', async () => {
    renderTable();
    expect(await screen.findByLabelText('Computed for Ansel Birchfield')).toHaveTextContent('Place 1 · 41.37 · 7 pts');
    expect(screen.getByLabelText('Computed for Orla Pinecrest')).toHaveTextContent('No result yet');
  });
});
