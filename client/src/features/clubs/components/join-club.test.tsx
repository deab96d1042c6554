import { describe, expect, it } from '@jest/globals';
import { screen, waitFor } from '@testing-library/react';
import { GraphQLError } from 'graphql';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import { JoinClub } from './join-club.js';

describe('JoinClub', () => {
  it('joins on a press and opens the club page', async () => {
    const { user, router } = renderWithProviders({
      element: <JoinClub token="tok-1" email="rowan.tamarack@example.org" />,
      path: '/join-club?token=tok-1',
      mocks: [{ request: { query: clubsDocuments.acceptClubInvitation, variables: { token: 'tok-1' } }, result: { data: { acceptClubInvitation: 'club-hollow' } } }],
    });
    expect(screen.getByText('rowan.tamarack@example.org')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Accept the invitation' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/clubs/club-hollow'));
  });

  it('says plainly when the invitation has expired', async () => {
    // the server's wording (server/src/league/invitations.service.ts)
    const message = 'This invitation has expired. Ask the club for a new one.';
    const { user } = renderWithProviders({
      element: <JoinClub token="tok-old" email="rowan.tamarack@example.org" />,
      mocks: [
        {
          request: { query: clubsDocuments.acceptClubInvitation, variables: { token: 'tok-old' } },
          result: { errors: [new GraphQLError(message, { extensions: { code: 'TOKEN_INVALID', field: 'token' } })] },
        },
      ],
    });
    await user.click(screen.getByRole('button', { name: 'Accept the invitation' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(message);
  });
});
