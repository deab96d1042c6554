import { gql, type TypedDocumentNode } from '@apollo/client';

import type { FieldNote, FieldNoteInput, FieldNotesFilter, FirstCuts, NoteHistory } from './types.js';

const NOTE_FIELDS = gql`
  fragment FieldNoteFields on FieldNote {
    id
    slug
    kind
    status
    authorId
    authorName
    revisionId
    revisionNumber
    isDraftView
    isPublished
    hasUnpublishedChanges
    title
    summary
    bodyMarkdown
    bodyHtml
    tags {
      species
      grinds
      events
      conditions
      free
    }
    evidence {
      kind
      refId
      species
      grind
      condition
      label
      summary
      href
    }
    publishedAt
    updatedAt
    firstCutsPosition
    readAt
    canEdit
    canSubmit
    canReview
    canPublish
    publishRefusal
  }
`;

type Id = { id: string };
type NoteResult<K extends string> = { [key in K]: FieldNote };

const fieldNotes: TypedDocumentNode<{ fieldNotes: FieldNote[] }, { filter: FieldNotesFilter }> = gql`
  query FieldNotes($filter: FieldNotesFilter) {
    fieldNotes(filter: $filter) {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const fieldNote: TypedDocumentNode<NoteResult<'fieldNote'>, { slug: string; draft: boolean }> = gql`
  query FieldNote($slug: String!, $draft: Boolean!) {
    fieldNote(slug: $slug, draft: $draft) {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const myFieldNotes: TypedDocumentNode<{ myFieldNotes: FieldNote[] }, Record<string, never>> = gql`
  query MyFieldNotes {
    myFieldNotes {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const reviewQueue: TypedDocumentNode<{ fieldNoteReviewQueue: FieldNote[] }, Record<string, never>> = gql`
  query FieldNoteReviewQueue {
    fieldNoteReviewQueue {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const history: TypedDocumentNode<{ fieldNoteHistory: NoteHistory }, Id> = gql`
  query FieldNoteHistory($id: ID!) {
    fieldNoteHistory(id: $id) {
      note {
        ...FieldNoteFields
      }
      revisions {
        id
        number
        title
        summary
        bodyMarkdown
        tags {
          species
          grinds
          events
          conditions
          free
        }
        writtenByName
        note
        isPublished
        createdAt
      }
      reviews {
        id
        action
        comment
        actorName
        revisionNumber
        createdAt
      }
    }
  }
  ${NOTE_FIELDS}
`;

const firstCuts: TypedDocumentNode<{ firstCuts: FirstCuts }, Record<string, never>> = gql`
  query FirstCuts {
    firstCuts {
      readCount
      steps {
        position
        note {
          ...FieldNoteFields
        }
      }
    }
  }
  ${NOTE_FIELDS}
`;

const createFieldNote: TypedDocumentNode<NoteResult<'createFieldNote'>, { input: FieldNoteInput }> = gql`
  mutation CreateFieldNote($input: FieldNoteInput!) {
    createFieldNote(input: $input) {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const updateFieldNote: TypedDocumentNode<NoteResult<'updateFieldNote'>, { id: string; input: FieldNoteInput }> = gql`
  mutation UpdateFieldNote($id: ID!, $input: FieldNoteInput!) {
    updateFieldNote(id: $id, input: $input) {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const submitFieldNote: TypedDocumentNode<NoteResult<'submitFieldNote'>, Id> = gql`
  mutation SubmitFieldNote($id: ID!) {
    submitFieldNote(id: $id) {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const publishFieldNote: TypedDocumentNode<NoteResult<'publishFieldNote'>, Id & { comment: string }> = gql`
  mutation PublishFieldNote($id: ID!, $comment: String!) {
    publishFieldNote(id: $id, comment: $comment) {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const sendBackFieldNote: TypedDocumentNode<NoteResult<'sendBackFieldNote'>, Id & { comment: string }> = gql`
  mutation SendBackFieldNote($id: ID!, $comment: String!) {
    sendBackFieldNote(id: $id, comment: $comment) {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const unpublishFieldNote: TypedDocumentNode<NoteResult<'unpublishFieldNote'>, Id & { comment: string }> = gql`
  mutation UnpublishFieldNote($id: ID!, $comment: String!) {
    unpublishFieldNote(id: $id, comment: $comment) {
      ...FieldNoteFields
    }
  }
  ${NOTE_FIELDS}
`;

const deleteFieldNoteDraft: TypedDocumentNode<{ deleteFieldNoteDraft: boolean }, Id> = gql`
  mutation DeleteFieldNoteDraft($id: ID!) {
    deleteFieldNoteDraft(id: $id)
  }
`;

// isDraftView is part of a note's cache key (lib/apollo.ts): without it the answer would not reach the open page.
const markFieldNoteRead: TypedDocumentNode<{ markFieldNoteRead: Pick<FieldNote, 'id' | 'isDraftView' | 'readAt'> }, Id & { read: boolean }> = gql`
  mutation MarkFieldNoteRead($id: ID!, $read: Boolean!) {
    markFieldNoteRead(id: $id, read: $read) {
      id
      isDraftView
      readAt
    }
  }
`;

const setFirstCuts: TypedDocumentNode<{ setFirstCuts: FirstCuts }, { noteIds: string[] }> = gql`
  mutation SetFirstCuts($noteIds: [ID!]!) {
    setFirstCuts(noteIds: $noteIds) {
      readCount
      steps {
        position
        note {
          ...FieldNoteFields
        }
      }
    }
  }
  ${NOTE_FIELDS}
`;

export const fieldNotesDocuments = {
  fieldNotes,
  fieldNote,
  myFieldNotes,
  reviewQueue,
  history,
  firstCuts,
  createFieldNote,
  updateFieldNote,
  submitFieldNote,
  publishFieldNote,
  sendBackFieldNote,
  unpublishFieldNote,
  deleteFieldNoteDraft,
  markFieldNoteRead,
  setFirstCuts,
};
