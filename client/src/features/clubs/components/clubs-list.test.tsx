import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import type { Club } from '../api/types.js';
import { ClubsList } from './clubs-list.js';

const hollow: Club = { __typename: 'Club', id: 'club-hollow', name: 'Hollow Pine Woodsmen', shortName: 'HPINE', region: 'Upper Hollow', colourPrimary: '#2f5d3a', colourSecondary: '#c9a66b', athleteCount: 4 };
const tamarack: Club = { ...hollow, id: 'club-tam', name: 'Tamarack Ridge Axemen', shortName: 'TRIDGE', region: 'Ridge Country', athleteCount: 0 };
const list = (clubs: Club[]) => ({ request: { query: clubsDocuments.clubs }, result: { data: { clubs } } });

describe('ClubsList', () => {
  it('lets an administrator add a club and shows it in the list', async () => {
    const input = { name: 'Tamarack Ridge Axemen', shortName: 'TRIDGE', region: 'Ridge Country', contactEmail: null, colourPrimary: '#2f5d3a', colourSecondary: '#c9a66b' };
    const { user } = renderWithProviders({
      element: <ClubsList myClubIds={[]} canAdd />,
      mocks: [list([hollow]), { request: { query: clubsDocuments.createClub, variables: { input } }, result: { data: { createClub: tamarack } } }, list([hollow, tamarack])],
    });
    await user.click(await screen.findByRole('button', { name: 'Add a club' }));
    const dialog = screen.getByRole('dialog', { name: 'Add a club' });
    await user.type(within(dialog).getByLabelText('Club name'), 'Tamarack Ridge Axemen');
    await user.type(within(dialog).getByLabelText('Short name'), 'tridge');
    await user.type(within(dialog).getByLabelText('Region'), 'Ridge Country');
    await user.click(within(dialog).getByRole('button', { name: 'Add club' }));
    expect(await screen.findByText('Tamarack Ridge Axemen added. Invite its coaches from the club page.')).toBeInTheDocument();
    expect(await screen.findByRole('heading', { name: 'Tamarack Ridge Axemen' })).toBeInTheDocument();
  });

  it('offers no adding to anyone else, and says who adds clubs when there are none', async () => {
    renderWithProviders({ element: <ClubsList myClubIds={[]} />, mocks: [list([])] });
    expect(await screen.findByText(/The league administrator adds clubs/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add a club' })).not.toBeInTheDocument();
  });
});
