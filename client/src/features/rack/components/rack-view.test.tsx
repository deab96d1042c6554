import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { rackDocuments } from '../api/rack-documents.js';
import { testAxe, testRack } from '../testing/rack-fixtures.js';
import { RackView } from './rack-view.js';

const CLUB = [{ id: 'club-1', name: 'Hollow Pine Woodsmen' }];
const dull = testAxe({ id: 'axe-dull', label: 'Practice 4', status: 'NEEDS_EDGE', grind: 'FLAT', geometry: { includedAngleDeg: 25, perSideAngleDeg: 12.5, chiselWidthMm: null, shoulderThicknessMm: null } });
const rackMock = (filter: Record<string, unknown>, axes = [testAxe(), dull]) => ({
  request: { query: rackDocuments.rack, variables: { clubId: 'club-1', filter } },
  result: { data: { rack: testRack(axes) } },
});
const meetsMock = { request: { query: rackDocuments.clubMeets, variables: { clubId: 'club-1' } }, result: { data: { meets: [] } } };

describe('RackView', () => {
  it("lists the club's axes with status, both bevel angles and sizes in the reader's units", async () => {
    renderWithProviders({ element: <RackView memberClubs={CLUB} anyClub={false} units="IMPERIAL" />, mocks: [rackMock({}), meetsMock] });
    const grid = await screen.findByRole('grid', { name: 'Axes in the rack' });
    expect(within(grid).getByRole('link', { name: 'Race 3' })).toHaveAttribute('href', '/rack/axes/axe-race-3');
    expect(within(grid).getByText('Needs an edge')).toBeInTheDocument();
    expect(within(grid).getByText('15° included · 7.5° per side')).toBeInTheDocument();
    // 19.05 mm ÷ 25.4 = 0.75 in; 2495 g ÷ 453.59237 = 5.5005 lb → "5.5 lb" (two decimals, zeros dropped).
    expect(within(grid).getByText('0.75 in')).toBeInTheDocument();
    expect(within(grid).getAllByText('5.5 lb')).toHaveLength(2);
    expect(screen.getByRole('note')).toHaveTextContent('Safety with the rack');
    expect(screen.getByRole('button', { name: 'Add axe' })).toBeInTheDocument();
  });

  it('filters by status through the address and asks the server for just those axes', async () => {
    const { user, router } = renderWithProviders({
      element: <RackView memberClubs={CLUB} anyClub={false} units="METRIC" />,
      mocks: [rackMock({}), meetsMock, rackMock({ statuses: ['NEEDS_EDGE'] }, [dull])],
    });
    await screen.findByRole('grid', { name: 'Axes in the rack' });
    await user.click(screen.getByRole('combobox', { name: 'Status' }));
    await user.click(screen.getByRole('option', { name: 'Needs an edge' }));
    expect(router.state.location.search).toBe('?status=NEEDS_EDGE');
    const grid = await screen.findByRole('grid', { name: 'Axes in the rack' });
    expect(await within(grid).findByRole('link', { name: 'Practice 4' })).toBeInTheDocument();
    expect(within(grid).queryByRole('link', { name: 'Race 3' })).not.toBeInTheDocument();
  });

  it('tells someone without a club how to reach a rack', async () => {
    renderWithProviders({ element: <RackView memberClubs={[]} anyClub={false} units="METRIC" /> });
    expect(await screen.findByText(/Ask your coach for an invitation/)).toBeInTheDocument();
  });
});
