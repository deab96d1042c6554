import { ApolloLink, gql } from '@apollo/client';
import { describe, expect, it } from '@jest/globals';
import { print } from 'graphql';
import { of } from 'rxjs';

import { createApolloClient } from '../../../lib/apollo.js';
import { fieldNotesDocuments as docs } from './field-notes-documents.js';

const OPEN_NOTE = gql`
  query OpenNote {
    note {
      id
      isDraftView
      readAt
    }
  }
`;

/** Answers like the server does: only the fields the operation asks for. */
const server = new ApolloLink((operation) => {
  const asked = print(operation.query);
  const note: Record<string, unknown> = { __typename: 'FieldNote', id: 'n1', readAt: '2026-12-01T10:00:00.000Z' };
  if (asked.includes('isDraftView')) note['isDraftView'] = false;
  return of({ data: { markFieldNoteRead: note } });
});

describe('marking a note read', () => {
  it('reaches the published note already on the page (a note is keyed by id and isDraftView)', async () => {
    const client = createApolloClient({ transport: server });
    client.cache.writeQuery({ query: OPEN_NOTE, data: { note: { __typename: 'FieldNote', id: 'n1', isDraftView: false, readAt: null } } });
    await client.mutate({ mutation: docs.markFieldNoteRead, variables: { id: 'n1', read: true } });
    expect(client.cache.readQuery<{ note: { readAt: string | null } }>({ query: OPEN_NOTE })?.note.readAt).toBe('2026-12-01T10:00:00.000Z');
  });
});
