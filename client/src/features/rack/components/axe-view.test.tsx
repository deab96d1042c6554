import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';
import { GraphQLError } from 'graphql';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { rackDocuments } from '../api/rack-documents.js';
import type { AxeDetail } from '../api/types.js';
import { testAxe } from '../testing/rack-fixtures.js';
import { AxeView } from './axe-view.js';

const detail = (over: Partial<AxeDetail> = {}): AxeDetail =>
  ({
    ...testAxe(),
    __typename: 'AxeDetail',
    canManage: true,
    photos: [],
    services: [
      {
        __typename: 'AxeService',
        id: 'svc-1',
        kind: 'REGRIND',
        doneOn: '2026-09-20',
        doneBy: 'Hale Dunmore',
        notes: 'Closed the bevel for the pine season.',
        changes: [{ __typename: 'AxeSetupChange', field: 'bevelIncludedDeg', before: '16', after: '15' }],
      },
    ],
    ...over,
  }) as AxeDetail;

const axeMock = (axe: AxeDetail) => ({ request: { query: rackDocuments.axe, variables: { id: 'axe-race-3' } }, result: { data: { axe } } });

describe('AxeView', () => {
  it('shows both bevel angles, the shoulder thickness and the service history in the reader\'s units', async () => {
    renderWithProviders({ element: <AxeView axeId="axe-race-3" units="IMPERIAL" today="2026-11-30" />, mocks: [axeMock(detail())] });
    const setup = await screen.findByRole('region', { name: 'Head and handle' });
    expect(within(setup).getByText('15°')).toBeInTheDocument();
    expect(within(setup).getByText('7.5°')).toBeInTheDocument();
    // 5.016 mm ÷ 25.4 = 0.19748 in → "0.197 in" at three decimals.
    expect(within(setup).getByText('0.197 in')).toBeInTheDocument();
    const history = screen.getByRole('list', { name: 'Service history of Race 3' });
    expect(within(history).getByText('2026-09-20 · Regrind · Hale Dunmore')).toBeInTheDocument();
    expect(within(history).getByText('Bevel: 16° included (8° per side) → 15° included (7.5° per side)')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Results with this axe' })).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Trials run with it' })).toBeInTheDocument();
  });

  it('logs a regrind with the new bevel, after showing the cautions for the grinder', async () => {
    const logged = detail({ geometry: { includedAngleDeg: 16, perSideAngleDeg: 8, chiselWidthMm: 19.05, shoulderThicknessMm: 5.355 } as AxeDetail['geometry'] });
    const { user } = renderWithProviders({
      element: <AxeView axeId="axe-race-3" units="METRIC" today="2026-11-30" />,
      mocks: [
        axeMock(detail()),
        {
          request: {
            query: rackDocuments.logAxeService,
            variables: { input: { axeId: 'axe-race-3', kind: 'REGRIND', doneOn: '2026-11-30', doneBy: null, notes: '', setup: { bevelIncludedDeg: 16 } } },
          },
          result: { data: { logAxeService: logged } },
        },
      ],
    });
    await user.click(await screen.findByRole('button', { name: 'Log a service' }));
    const dialog = screen.getByRole('dialog', { name: 'Log a service: Race 3' });
    expect(within(dialog).getByRole('note')).toHaveTextContent('Safety at the grinder and the bench');
    await user.type(within(dialog).getByLabelText('New bevel, included angle'), '16');
    await user.click(within(dialog).getByRole('button', { name: 'Log service' }));
    expect(await screen.findByText('Regrind logged for Race 3.')).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: 'Head and handle' })).getByText('16°')).toBeInTheDocument();
  });

  it("asks before deleting an axe and keeps the server's refusal in view when it has history", async () => {
    const refusal = 'Race 3 is on record in 2 results. Set its status to retired instead, so that history keeps its axe.';
    const { user } = renderWithProviders({
      element: <AxeView axeId="axe-race-3" units="METRIC" today="2026-11-30" />,
      mocks: [
        axeMock(detail()),
        { request: { query: rackDocuments.deleteAxe, variables: { id: 'axe-race-3' } }, result: { errors: [new GraphQLError(refusal, { extensions: { code: 'BAD_USER_INPUT', field: 'id' } })] } },
      ],
    });
    await user.click(await screen.findByRole('button', { name: 'Delete' }));
    const dialog = screen.getByRole('dialog', { name: 'Delete Race 3?' });
    expect(dialog).toHaveTextContent('set its status to retired instead');
    await user.click(within(dialog).getByRole('button', { name: 'Delete axe' }));
    expect(await within(dialog).findByText(refusal)).toBeInTheDocument();
  });

  it('offers no delete to a reader who cannot manage the rack', async () => {
    renderWithProviders({ element: <AxeView axeId="axe-race-3" units="METRIC" today="2026-11-30" />, mocks: [axeMock(detail({ canManage: false }))] });
    await screen.findByRole('region', { name: 'Head and handle' });
    expect(screen.queryByRole('button', { name: 'Delete' })).not.toBeInTheDocument();
  });
});

