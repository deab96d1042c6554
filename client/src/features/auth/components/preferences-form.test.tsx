import { describe, expect, it } from '@jest/globals';
import { screen } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { testUser } from '../../../../test/fixtures.js';
import { authDocuments } from '../api/auth-documents.js';
import { PreferencesForm } from './preferences-form.js';

describe('PreferencesForm', () => {
  it('saves a switch to inches and pounds', async () => {
    const before = testUser({ unitSystem: 'METRIC' });
    const { user } = renderWithProviders({
      element: <PreferencesForm user={before} />,
      mocks: [
        {
          request: {
            query: authDocuments.updateMyPreferences,
            variables: { displayName: 'Rowan Tamarack', unitSystem: 'IMPERIAL' },
          },
          result: { data: { updateMyPreferences: { ...before, unitSystem: 'IMPERIAL' } } },
        },
      ],
    });

    expect(screen.getByRole('button', { name: 'Metric (mm, kg)' })).toHaveAttribute('aria-pressed', 'true');
    await user.click(screen.getByRole('button', { name: 'Imperial (in, lb)' }));
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByRole('status')).toHaveTextContent('Saved.');
    expect(screen.getByRole('button', { name: 'Imperial (in, lb)' })).toHaveAttribute('aria-pressed', 'true');
  });

  it('refuses an empty display name', async () => {
    const { user } = renderWithProviders({ element: <PreferencesForm user={testUser()} /> });
    await user.clear(screen.getByLabelText('Display name'));
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Enter the name other people will see.')).toBeInTheDocument();
  });
});
