import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../test/render-with-providers.js';
import { setViewport } from '../../../test/viewport.js';
import { AppShell } from './app-shell.js';

function renderShell(path = '/results') {
  return renderWithProviders({
    path,
    element: (
      <AppShell accountMenu={<span>account</span>}>
        <p>page body</p>
      </AppShell>
    ),
  });
}

function linkNames(nav: HTMLElement): string[] {
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent ?? '');
}

describe('AppShell', () => {
  it('shows the bottom bar with four places and More on a phone', async () => {
    setViewport({ width: 390 }); // a common phone width in CSS px
    const { user } = renderShell();

    const nav = screen.getByRole('navigation', { name: 'Places' });
    expect(linkNames(nav)).toEqual(['Meets', 'Results', 'Rack', 'Field Notes']);
    expect(within(nav).getByRole('link', { name: 'Results' })).toHaveAttribute('aria-current', 'page');

    await user.click(within(nav).getByRole('button', { name: 'More' }));
    const more = await screen.findByRole('dialog', { name: 'More places' });
    expect(linkNames(more)).toEqual(['Standings', 'Trials', 'Grain Map', 'First Cuts']);
  });

  it('shows the rail with every place at desktop width', () => {
    setViewport({ width: 1440 });
    renderShell('/grain-map');

    const nav = screen.getByRole('navigation', { name: 'Places' });
    expect(linkNames(nav)).toEqual([
      'Meets',
      'Results',
      'Standings',
      'Rack',
      'Trials',
      'Grain Map',
      'Field Notes',
      'First Cuts',
    ]);
    expect(within(nav).getByRole('link', { name: 'Grain Map' })).toHaveAttribute('aria-current', 'page');
    expect(within(nav).queryByRole('button', { name: 'More' })).not.toBeInTheDocument();
  });

  it('sends the search words to the search page', async () => {
    const { user, router } = renderShell('/');
    await user.type(screen.getByRole('searchbox', { name: 'Search' }), 'wet poplar{Enter}');
    expect(router.state.location.pathname).toBe('/search');
    expect(router.state.location.search).toBe('?q=wet+poplar');
  });

  it('puts the page inside the main landmark', () => {
    renderShell();
    expect(within(screen.getByRole('main')).getByText('page body')).toBeInTheDocument();
  });
});
