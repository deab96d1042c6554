import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { resultsDocuments as docs } from '../api/results-documents.js';
import type { MeetTimekeeper } from '../api/types.js';
import { TimekeepersPanel } from './timekeepers-panel.js';

const tamsin: MeetTimekeeper = { __typename: 'MeetTimekeeper', userId: 'u-1', displayName: 'Tamsin Ashbrook', email: 'tamsin@example.org', appointedAt: '2026-11-30T10:00:00.000Z' };
const list = (keepers: MeetTimekeeper[]) => ({ request: { query: docs.meetTimekeepers, variables: { meetId: 'meet-1' } }, result: { data: { meetTimekeepers: keepers } } });

describe('TimekeepersPanel', () => {
  it('says only organisers post while nobody is appointed, then lists whom the organiser appoints', async () => {
    const { user } = renderWithProviders({
      element: <TimekeepersPanel meetId="meet-1" />,
      mocks: [list([]), { request: { query: docs.appointTimekeeper, variables: { meetId: 'meet-1', email: 'tamsin@example.org' } }, result: { data: { appointTimekeeper: [tamsin] } } }],
    });
    expect(await screen.findByText(/No timekeepers yet/)).toBeInTheDocument();
    await user.type(screen.getByLabelText(/Email/), 'tamsin@example.org');
    await user.click(screen.getByRole('button', { name: 'Appoint timekeeper' }));
    expect(await screen.findByRole('status')).toHaveTextContent("Tamsin Ashbrook can now post this meet's results.");
    expect(within(screen.getByRole('list', { name: 'Timekeepers for this meet' })).getByText('Tamsin Ashbrook')).toBeInTheDocument();
  });

  it('puts the server’s refusal next to the e-mail field', async () => {
    const { user } = renderWithProviders({
      element: <TimekeepersPanel meetId="meet-1" />,
      mocks: [
        list([]),
        {
          request: { query: docs.appointTimekeeper, variables: { meetId: 'meet-1', email: 'nobody@example.org' } },
          result: { errors: [{ message: 'No Endgrain account uses nobody@example.org. Ask them to sign up first, then appoint them.', extensions: { code: 'BAD_USER_INPUT', field: 'email' } }] },
        },
      ],
    });
    await screen.findByText(/No timekeepers yet/);
    await user.type(screen.getByLabelText(/Email/), 'nobody@example.org');
    await user.click(screen.getByRole('button', { name: 'Appoint timekeeper' }));
    expect(await screen.findByText(/No Endgrain account uses nobody@example.org/)).toBeInTheDocument();
    expect(screen.getByLabelText(/Email/)).toHaveAttribute('aria-invalid', 'true');
  });

  it('asks before taking a timekeeper off the meet', async () => {
    const { user } = renderWithProviders({
      element: <TimekeepersPanel meetId="meet-1" />,
      mocks: [list([tamsin]), { request: { query: docs.removeTimekeeper, variables: { meetId: 'meet-1', userId: 'u-1' } }, result: { data: { removeTimekeeper: [] } } }],
    });
    await user.click(await screen.findByRole('button', { name: 'Remove Tamsin Ashbrook' }));
    const dialog = screen.getByRole('dialog', { name: 'Remove Tamsin Ashbrook?' });
    expect(dialog).toHaveTextContent('Results they already posted stay.');
    await user.click(within(dialog).getByRole('button', { name: 'Remove' }));
    // The page is readable again once the dialog has gone.
    expect(await screen.findByRole('status')).toHaveTextContent('Appoint them again to undo.');
    expect(screen.getByText(/No timekeepers yet/)).toBeInTheDocument();
  });
});
