import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';
import { GraphQLError } from 'graphql';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { rackDocuments } from '../api/rack-documents.js';
import { testAxe, testEntry, testLineup, testRack } from '../testing/rack-fixtures.js';
import { LineupView } from './lineup-view.js';

const vars = { meetId: 'meet-1', clubId: 'club-1' };
const expertAxe = testAxe({ id: 'axe-x', label: 'Race 1', allowedFor: 'EXPERIENCED_ONLY' });
const looseAxe = testAxe({ id: 'axe-l', label: 'Old Blue', status: 'HEAD_LOOSE' });
const lineupMock = (entries = [testEntry()]) => ({ request: { query: rackDocuments.lineup, variables: vars }, result: { data: { lineup: testLineup(entries) } } });
const overridesMock = { request: { query: rackDocuments.lineupOverrides, variables: vars }, result: { data: { lineupOverrides: [] } } };
const rackMock = { request: { query: rackDocuments.rack, variables: { clubId: 'club-1', filter: null } }, result: { data: { rack: testRack([expertAxe, looseAxe]) } } };
// The server's wording (server/src/rack/lineups/lineup-rules.ts).
const WARNING = 'Race 1 is for experienced athletes only; Tamsin Reedy is a rookie. Override recorded: "Coached on it all autumn".';
const assignMock = (overrideReason: string | null, result: object) => ({
  request: { query: rackDocuments.assignLineup, variables: { input: { entryId: 'entry-1', athleteId: 'ath-tamsin', axeId: 'axe-x', overrideReason } } },
  result,
});
const assigned = {
  data: {
    assignLineup: {
      __typename: 'AssignLineupPayload',
      warnings: [WARNING],
      assignment: {
        __typename: 'LineupAssignment',
        entryId: 'entry-1',
        athleteId: 'ath-tamsin',
        athleteName: 'Tamsin Reedy',
        axeId: 'axe-x',
        axeLabel: 'Race 1',
        axeStatus: 'READY',
        override: { __typename: 'LineupOverride', id: 'ov-1', reason: 'Coached on it all autumn', byName: 'Coach', athleteName: 'Tamsin Reedy', axeLabel: 'Race 1' },
      },
    },
  },
};

describe('LineupView', () => {
  it('carries the safety cautions and keeps out-of-use axes out of the choice', async () => {
    const { user } = renderWithProviders({ element: <LineupView {...vars} />, mocks: [lineupMock(), overridesMock, rackMock] });
    expect(await screen.findByRole('note')).toHaveTextContent('Safety before handing out axes');
    await user.click(screen.getByRole('button', { name: 'Set lineup for Underhand chop, Tamsin Reedy' }));
    const dialog = screen.getByRole('dialog', { name: 'Lineup: Underhand chop' });
    await user.click(within(dialog).getByRole('combobox', { name: 'Axe' }));
    expect(await screen.findByRole('option', { name: 'Old Blue · Head loose · Anyone' })).toHaveAttribute('aria-disabled', 'true');
  });

  it('asks for a reason before an experienced-only axe goes to a rookie, and shows the recorded override', async () => {
    const { user } = renderWithProviders({
      element: <LineupView {...vars} />,
      mocks: [lineupMock(), overridesMock, rackMock, assignMock('Coached on it all autumn', assigned), lineupMock(), overridesMock],
    });
    await user.click(await screen.findByRole('button', { name: 'Set lineup for Underhand chop, Tamsin Reedy' }));
    const dialog = screen.getByRole('dialog', { name: 'Lineup: Underhand chop' });
    await user.click(within(dialog).getByRole('combobox', { name: 'Axe' }));
    await user.click(await screen.findByRole('option', { name: 'Race 1 · Ready · Experienced only' }));
    const reason = within(dialog).getByLabelText('Reason for the override');
    expect(within(dialog).getByText(/the reason is recorded with your name/)).toBeInTheDocument();
    await user.type(reason, 'Coached on it all autumn');
    await user.click(within(dialog).getByRole('button', { name: 'Save' }));
    expect(await screen.findByText(WARNING)).toBeInTheDocument();
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
  });

  it("puts the server's refusal beside the reason box", async () => {
    const refusal = 'Race 1 is for experienced athletes only; Tamsin Reedy is a rookie. To hand it over anyway, give the reason for the override (at least 10 characters); it is recorded.';
    const { user } = renderWithProviders({
      element: <LineupView {...vars} />,
      mocks: [lineupMock(), overridesMock, rackMock, assignMock('too short', { errors: [new GraphQLError(refusal, { extensions: { code: 'BAD_USER_INPUT', field: 'overrideReason' } })] })],
    });
    await user.click(await screen.findByRole('button', { name: 'Set lineup for Underhand chop, Tamsin Reedy' }));
    const dialog = screen.getByRole('dialog', { name: 'Lineup: Underhand chop' });
    await user.click(within(dialog).getByRole('combobox', { name: 'Axe' }));
    await user.click(await screen.findByRole('option', { name: 'Race 1 · Ready · Experienced only' }));
    await user.type(within(dialog).getByLabelText('Reason for the override'), 'too short');
    await user.click(within(dialog).getByRole('button', { name: 'Save' }));
    expect(await within(dialog).findByText(refusal)).toBeInTheDocument();
  });
});
