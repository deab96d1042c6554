import { describe, expect, it } from '@jest/globals';
import { render, screen, within } from '@testing-library/react';

import type { NoteRevision } from '../api/types.js';
import { RevisionDiff } from './revision-diff.js';

const revision = (number: number, bodyMarkdown: string): NoteRevision => ({
  id: `rev-${number}`, number, title: 'Edges', summary: 'Caring for an edge.', bodyMarkdown,
  tags: { species: [], grinds: [], events: [], conditions: [], free: [] }, writtenByName: 'Tamsin Oakridge', note: '', isPublished: number === 1, createdAt: '2026-10-01T00:00:00Z',
});

describe('RevisionDiff', () => {
  it('lists a changed line as removed then added, and counts the changes', () => {
    render(<RevisionDiff older={revision(1, 'Hone it.\nSheathe it.')} newer={revision(2, 'Hone it gently.\nSheathe it.')} />);
    // hand-worked: only the first body line differs, so 2 lines change (one out, one in).
    expect(screen.getByText('2 lines changed from revision 1 to revision 2.')).toBeInTheDocument();
    const list = screen.getByRole('list', { name: 'Changes from revision 1 to 2' });
    const items = within(list).getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toContain('4−Removed: Hone it.');
    expect(items).toContain('4+Added: Hone it gently.');
  });

  it('says when two revisions read the same', () => {
    render(<RevisionDiff older={revision(1, 'Same.')} newer={revision(2, 'Same.')} />);
    expect(screen.getByText('The two revisions have the same text.')).toBeInTheDocument();
  });
});
