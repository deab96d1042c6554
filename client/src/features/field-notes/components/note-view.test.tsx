import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { fieldNotesDocuments } from '../api/field-notes-documents.js';
import type { FieldNote } from '../api/types.js';
import { testNote } from '../testing/note-fixtures.js';
import { NoteView } from './note-view.js';

const firstCutsMock = { request: { query: fieldNotesDocuments.firstCuts }, result: { data: { firstCuts: { readCount: 0, steps: [] } } } };

function renderNote(note: FieldNote, signedIn = false) {
  return renderWithProviders({ element: <NoteView note={note} signedIn={signedIn} onChanged={() => undefined} />, mocks: [firstCutsMock] });
}

describe('NoteView', () => {
  it('shows a finding with its evidence beside the text, linked to the Grain Map cell', () => {
    renderNote(testNote());
    const evidence = screen.getByRole('complementary', { name: 'Evidence' });
    expect(within(evidence).getByRole('link', { name: 'Green aspen × chisel' })).toHaveAttribute('href', '/grain-map?species=quaking-aspen&condition=GREEN&cell=quaking-aspen~CHISEL');
    expect(within(evidence).getByText(/14 results, 6 athletes/)).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 2, name: 'What we saw' })).toBeInTheDocument();
  });

  it('prints markup an author typed as text, with no element or handler behind it', () => {
    const { container } = renderNote(testNote({ bodyMarkdown: '<img src=x onerror="window.hacked=1"> [tap](javascript:alert) <script>window.hacked=2</script>' }));
    expect(screen.getByText(/<img src=x onerror="window.hacked=1">/)).toBeInTheDocument();
    expect(container.querySelector('.note-body img, .note-body script, .note-body [onerror]')).toBeNull();
    expect(screen.queryByRole('link', { name: 'tap' })).toBeNull();
  });

  it('tells a coach in review why they cannot publish, and offers no publish button', () => {
    renderNote(testNote({ status: 'IN_REVIEW', isPublished: false, isDraftView: true, canReview: false, publishRefusal: 'Only a league administrator publishes Field Notes.' }));
    expect(screen.queryByRole('button', { name: 'Publish' })).toBeNull();
  });

  it('offers a reviewer publish and send back, and explains a finding they wrote', () => {
    renderNote(testNote({ status: 'IN_REVIEW', isPublished: false, isDraftView: true, canReview: true, canPublish: false, publishRefusal: 'A finding needs a second pair of eyes: another administrator publishes it.' }));
    const actions = screen.getByRole('group', { name: 'Note actions' });
    expect(within(actions).queryByRole('button', { name: 'Publish' })).toBeNull();
    expect(within(actions).getByRole('button', { name: 'Send back' })).toBeInTheDocument();
    expect(screen.getByText(/second pair of eyes/)).toBeInTheDocument();
  });

  it('asks a visitor to sign in to keep their reading progress, and shows a signed-in reader the button', () => {
    const { unmount } = renderNote(testNote());
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in?returnTo=%2Ffield-notes%2Fchisels-in-green-aspen');
    unmount();
    renderNote(testNote({ readAt: '2026-11-01T10:00:00.000Z' }), true);
    expect(screen.getByRole('button', { name: 'Read — mark as unread' })).toHaveAttribute('aria-pressed', 'true');
  });

  it('shows the usual cautions on a guide', () => {
    renderNote(testNote({ kind: 'GUIDE', evidence: [] }));
    expect(screen.getByRole('note')).toHaveTextContent("sanctioning body's rules");
    expect(screen.queryByRole('complementary', { name: 'Evidence' })).toBeNull();
  });
});
