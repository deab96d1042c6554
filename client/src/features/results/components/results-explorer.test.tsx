import { describe, expect, it } from '@jest/globals';
import { screen } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { resultsDocuments } from '../api/results-documents.js';
import { testResult } from '../testing/result-fixtures.js';
import { ResultsExplorer } from './results-explorer.js';

const options = { request: { query: resultsDocuments.explorerOptions }, result: { data: { seasons: [], clubs: [], eventTypes: [] } }, maxUsageCount: 5 };
const page = (filter: object, sort: object, rows = [testResult()]) => ({
  request: { query: resultsDocuments.results, variables: { filter, sort, page: { page: 0, pageSize: 25 } } },
  result: { data: { results: { __typename: 'ResultsPage', total: rows.length, capped: false, page: 0, pageSize: 25, rows } } },
});

describe('ResultsExplorer', () => {
  it('asks the server for the filter in the address and offers it as a CSV export', async () => {
    renderWithProviders({
      element: <ResultsExplorer units="IMPERIAL" />,
      path: '/results?grind=convex&sort=points&dir=desc',
      mocks: [options, page({ grind: 'CONVEX' }, { field: 'POINTS', direction: 'DESC' })],
    });
    expect(await screen.findByText('Ansel Birchfield')).toBeInTheDocument();
    // 304.8 mm = 12 in exactly (NIST SP 811).
    expect(screen.getByText('Eastern white pine, 12 in, seasoned')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: /Export these results/ })).toHaveAttribute('href', '/api/results.csv?grind=CONVEX&sort=POINTS&direction=DESC');
  });

  it('puts a new sort in the address and starts at the first page', async () => {
    const { user, router } = renderWithProviders({
      element: <ResultsExplorer units="METRIC" />,
      path: '/results?page=0',
      mocks: [options, page({}, { field: 'TIME', direction: 'ASC' }), page({}, { field: 'DATE', direction: 'ASC' })],
    });
    await screen.findByText('Ansel Birchfield');
    await user.click(screen.getByRole('columnheader', { name: 'Date' }));
    expect(router.state.location.search).toBe('?sort=date');
  });

  it('says what to do when nothing matches', async () => {
    renderWithProviders({
      element: <ResultsExplorer units="METRIC" />,
      path: '/results?condition=frozen',
      mocks: [options, page({ condition: 'FROZEN' }, { field: 'TIME', direction: 'ASC' }, [])],
    });
    expect(await screen.findByText('No published results match these filters. Widen them, or clear the filters.')).toBeInTheDocument();
  });
});
