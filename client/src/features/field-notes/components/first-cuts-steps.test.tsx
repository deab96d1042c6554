import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { testNote } from '../testing/note-fixtures.js';
import { FirstCutsSteps } from './first-cuts-steps.js';

const series = {
  readCount: 1,
  steps: [
    { position: 1, note: testNote({ id: 'a', slug: 'safety-first', kind: 'SAFETY_NOTE', title: 'Safety first', readAt: '2026-10-01T00:00:00Z' }) },
    { position: 2, note: testNote({ id: 'b', slug: 'blocks', kind: 'GUIDE', title: 'Picking a block' }) },
    { position: 3, note: testNote({ id: 'c', slug: 'edges', kind: 'GUIDE', title: 'Caring for an edge' }) },
  ],
};

describe('FirstCutsSteps', () => {
  it('lists the steps in order with the reader’s progress and the next step to read', () => {
    renderWithProviders({ element: <FirstCutsSteps series={series} signedIn /> });
    expect(screen.getByText('1 of 3 read · next: Picking a block')).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: '1 of 3 read · next: Picking a block' })).toHaveAttribute('aria-valuenow', '33');
    const links = within(screen.getByRole('list', { name: 'First Cuts steps' })).getAllByRole('link');
    expect(links.map((l) => l.getAttribute('href'))).toEqual(['/field-notes/safety-first', '/field-notes/blocks', '/field-notes/edges']);
    expect(links[0]).toHaveTextContent('Read · Safety note');
  });

  it('shows no progress to a visitor', () => {
    renderWithProviders({ element: <FirstCutsSteps series={series} signedIn={false} /> });
    expect(screen.queryByRole('progressbar')).toBeNull();
  });
});
