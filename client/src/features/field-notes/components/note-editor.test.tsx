import { describe, expect, it, jest } from '@jest/globals';
import { screen } from '@testing-library/react';
import { GraphQLError } from 'graphql';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { fieldNotesDocuments } from '../api/field-notes-documents.js';
import { NoteEditor } from './note-editor.js';

const input = {
  kind: 'FINDING',
  title: 'Chisels in green aspen',
  summary: 'What the autumn trials said.',
  bodyMarkdown: 'Deeper cuts.',
  tags: { species: [], conditions: [], grinds: [], events: [], free: [] },
  evidence: [],
  note: '',
};

describe('NoteEditor', () => {
  it('says what is missing before anything is sent', async () => {
    const { user } = renderWithProviders({ element: <NoteEditor onSaved={jest.fn()} /> });
    await user.type(screen.getByLabelText('Title'), 'Axe');
    await user.click(screen.getByRole('button', { name: 'Save draft' }));
    expect(await screen.findByText('A title needs at least 5 characters.')).toBeInTheDocument();
    expect(screen.getByText('Write the note itself.')).toBeInTheDocument();
  });

  it('puts a server refusal of a tag beside the tag field', async () => {
    const refusal = new GraphQLError('"ironwood" is not a species Endgrain knows.', { extensions: { code: 'BAD_USER_INPUT', field: 'tags.species' } });
    const onSaved = jest.fn();
    const { user } = renderWithProviders({
      element: <NoteEditor onSaved={onSaved} />,
      mocks: [{ request: { query: fieldNotesDocuments.createFieldNote, variables: { input } }, result: { errors: [refusal] } }],
    });
    await user.type(screen.getByLabelText('Title'), input.title);
    await user.type(screen.getByLabelText('Summary'), input.summary);
    await user.type(screen.getByLabelText('Note text (markdown)'), input.bodyMarkdown);
    await user.click(screen.getByRole('button', { name: 'Save draft' }));
    expect(await screen.findByText('"ironwood" is not a species Endgrain knows.')).toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: 'Species' })).toHaveAttribute('aria-invalid', 'true');
    expect(onSaved).not.toHaveBeenCalled();
  });

  it('previews the text with the same strict renderer the server uses', async () => {
    const { user } = renderWithProviders({ element: <NoteEditor onSaved={jest.fn()} /> });
    await user.type(screen.getByLabelText('Note text (markdown)'), '# Boots{enter}{enter}<b>no</b>');
    await user.click(screen.getByRole('tab', { name: 'Preview' }));
    expect(screen.getByRole('heading', { level: 2, name: 'Boots' })).toBeInTheDocument();
    expect(screen.getByText('<b>no</b>')).toBeInTheDocument();
  });
});
