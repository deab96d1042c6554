import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';
import { GraphQLError } from 'graphql';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import { testAthlete, testClub } from '../testing/club-fixtures.js';
import { ClubView } from './club-view.js';

const clubMock = (canManage: boolean) => ({
  request: { query: clubsDocuments.club, variables: { id: 'club-hollow' } },
  result: { data: { club: testClub({ canManage }) } },
});
const noInvitations = {
  request: { query: clubsDocuments.clubInvitations, variables: { clubId: 'club-hollow' } },
  result: { data: { clubInvitations: [] } },
};

describe('ClubView', () => {
  it('shows a visitor the roster without any coach controls', async () => {
    renderWithProviders({ element: <ClubView clubId="club-hollow" />, mocks: [clubMock(false)] });
    const grid = await screen.findByRole('grid', { name: 'Roster' });
    expect(within(grid).getByRole('link', { name: 'Rowan Tamarack' })).toHaveAttribute('href', '/athletes/ath-rowan');
    expect(within(grid).getByText("Men's, Mixed")).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add athlete' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Edit Rowan Tamarack' })).not.toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'Invite to the club' })).not.toBeInTheDocument();
  });

  it("asks a coach for the athlete's names and a division before adding them", async () => {
    const { user } = renderWithProviders({ element: <ClubView clubId="club-hollow" />, mocks: [clubMock(true), noInvitations] });
    await user.click(await screen.findByRole('button', { name: 'Add athlete' }));
    const dialog = screen.getByRole('dialog', { name: 'Add an athlete' });
    await user.click(within(dialog).getByRole('button', { name: 'Add athlete' }));
    // wording mirrors the server (server/src/league/clubs.service.ts)
    expect(await within(dialog).findByText('First name is required.')).toBeInTheDocument();
    expect(within(dialog).getByText('Pick at least one division.')).toBeInTheDocument();
    expect(screen.getByText('No invitations sent yet. Invite a coach or an athlete by e-mail above.')).toBeInTheDocument();
  });

  it("keeps the athlete and shows the server's reason when removal is refused", async () => {
    const message = 'Rowan Tamarack has meet entries; withdraw them first (results are kept for the record).';
    const { user } = renderWithProviders({
      element: <ClubView clubId="club-hollow" />,
      mocks: [
        clubMock(true),
        noInvitations,
        {
          request: { query: clubsDocuments.removeAthlete, variables: { id: testAthlete().id } },
          result: { errors: [new GraphQLError(message, { extensions: { code: 'BAD_USER_INPUT', field: 'athleteId' } })] },
        },
      ],
    });
    await user.click(await screen.findByRole('button', { name: 'Edit Rowan Tamarack' }));
    await user.click(screen.getByRole('button', { name: 'Remove from roster' }));
    const confirm = screen.getByRole('dialog', { name: 'Remove Rowan Tamarack?' });
    await user.click(within(confirm).getByRole('button', { name: 'Remove' }));
    expect(await within(confirm).findByRole('alert')).toHaveTextContent(message);
    await user.click(within(confirm).getByRole('button', { name: 'Keep Rowan' }));
    expect(screen.getByRole('dialog', { name: 'Edit Rowan Tamarack' })).toBeInTheDocument();
  });

  it("lets a coach edit the club's details and puts the server's refusal next to the field", async () => {
    const input = { name: 'Hollow Pine Woodsmen', shortName: 'CFORK', region: 'Upper Hollow', contactEmail: null, colourPrimary: '#2f5d3a', colourSecondary: testClub().colourSecondary };
    const { user } = renderWithProviders({
      element: <ClubView clubId="club-hollow" />,
      mocks: [
        clubMock(true),
        noInvitations,
        { request: { query: clubsDocuments.updateClub, variables: { id: 'club-hollow', input } }, result: { errors: [new GraphQLError('The short name "CFORK" is taken.', { extensions: { code: 'BAD_USER_INPUT', field: 'shortName' } })] } },
      ],
    });
    await user.click(await screen.findByRole('button', { name: 'Edit club details' }));
    const dialog = screen.getByRole('dialog', { name: 'Edit club details' });
    const short = within(dialog).getByLabelText('Short name');
    await user.clear(short);
    await user.type(short, 'cfork');
    await user.click(within(dialog).getByRole('button', { name: 'Save' }));
    expect(await within(dialog).findByText('The short name "CFORK" is taken.')).toBeInTheDocument();
    expect(short).toHaveAttribute('aria-invalid', 'true');
  });

  it('offers no club editing to a visitor', async () => {
    renderWithProviders({ element: <ClubView clubId="club-hollow" />, mocks: [clubMock(false)] });
    await screen.findByRole('grid', { name: 'Roster' });
    expect(screen.queryByRole('button', { name: 'Edit club details' })).not.toBeInTheDocument();
  });
});
