import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { Result } from '../api/types.js';
import { testResult } from '../testing/result-fixtures.js';
import { AxeResultsList } from './axe-results-list.js';

const render = (results: Result[], units: 'METRIC' | 'IMPERIAL' = 'METRIC') =>
  renderWithProviders({
    element: <AxeResultsList axeId="axe-1" units={units} />,
    mocks: [{ request: { query: resultsDocuments.axeResults, variables: { axeId: 'axe-1' } }, result: { data: { axeResults: results } } }],
  });

describe('AxeResultsList', () => {
  it('says when the axe has no published results yet', async () => {
    render([]);
    expect(await screen.findByText(/No published results with this axe yet/)).toBeInTheDocument();
  });

  it('lists each result with its meet, athlete, time, place and the head it was chopped with then', async () => {
    render([testResult({ axeId: 'axe-1', axeLabel: 'Race 1' })], 'IMPERIAL');
    const list = await screen.findByRole('list', { name: 'Published results with this axe' });
    const item = within(list).getByRole('listitem');
    expect(within(item).getByRole('link', { name: 'Hollow Pine Fall Chop' })).toHaveAttribute('href', '/results/meets/meet-1');
    // 4137 hundredths = 41.37 s; 6.35 mm = 0.25 in; 304.8 mm = 12 in. The axe's own label is left out of its page.
    expect(item).toHaveTextContent('Ansel Birchfield: 41.37, place 1');
    expect(item).toHaveTextContent('head then: Convex · 32° included · chisel 0.25 in');
    expect(item).toHaveTextContent('Eastern white pine, 12 in, seasoned');
    expect(item).not.toHaveTextContent('Race 1');
  });
});
