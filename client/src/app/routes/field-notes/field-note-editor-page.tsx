import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import { useNavigate, useParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { fieldNotesDocuments as docs } from '../../../features/field-notes/api/field-notes-documents.js';
import type { FieldNote } from '../../../features/field-notes/api/types.js';
import { NoteEditor } from '../../../features/field-notes/components/note-editor.js';
import { WORKING_COPY } from '../../../features/field-notes/lib/note-labels.js';

function useOpenSaved() {
  const navigate = useNavigate();
  return (note: FieldNote) => void navigate(paths.fieldNote.href(note.slug, { draft: true }));
}

export function NewFieldNotePage() {
  const openSaved = useOpenSaved();
  return (
    <Stack spacing={2}>
      <PageHeading lead="Write it as you would explain it at the block. A reviewer reads it before it is published; findings need evidence and a second reader.">Write a note</PageHeading>
      <NoteEditor onSaved={openSaved} />
    </Stack>
  );
}

export function EditFieldNotePage() {
  const { slug = '' } = useParams();
  const openSaved = useOpenSaved();
  const { data, loading, error } = useQuery(docs.fieldNote, { variables: { slug, draft: true }, ...WORKING_COPY });
  if (loading) return <PageLoading label="Loading the note" />;
  if (error || !data) return <Alert severity="error" role="alert">The note could not be loaded{error ? `: ${error.message}` : '.'}</Alert>;
  const note = data.fieldNote;
  return (
    <Stack spacing={2}>
      <PageHeading lead={`Saving makes revision ${note.revisionNumber + 1}. ${note.isPublished ? 'Visitors keep reading the published revision until the new one is reviewed and published.' : ''}`}>
        {`Edit: ${note.title}`}
      </PageHeading>
      {note.canEdit ? (
        <NoteEditor note={note} onSaved={openSaved} />
      ) : (
        <Alert severity="info">{note.status === 'IN_REVIEW' ? 'This note is waiting for review. It can be edited again once it is sent back or published.' : 'Only its author or an administrator edits this note.'}</Alert>
      )}
    </Stack>
  );
}
