import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { fieldNotesDocuments as docs } from '../../../features/field-notes/api/field-notes-documents.js';
import type { FieldNote } from '../../../features/field-notes/api/types.js';
import { NoteGrid } from '../../../features/field-notes/components/note-grid.js';
import { WORKING_COPY } from '../../../features/field-notes/lib/note-labels.js';

const draftHref = (note: FieldNote) => paths.fieldNote.href(note.slug, { draft: true });

function Listing({ notes, loading, error, empty }: { notes: FieldNote[] | undefined; loading: boolean; error: Error | undefined; empty: string }) {
  if (loading) return <PageLoading />;
  if (error) return <Alert severity="error" role="alert">The list could not be loaded: {error.message}</Alert>;
  if (!notes?.length) return <Paper variant="outlined" sx={{ p: 3 }}><Typography>{empty}</Typography></Paper>;
  return <NoteGrid notes={notes} hrefFor={draftHref} showStatus />;
}

/** The signed-in writer's own notes, in every state. */
export function MyFieldNotesPage() {
  const { data, loading, error } = useQuery(docs.myFieldNotes, WORKING_COPY);
  return (
    <Stack spacing={3}>
      <PageHeading lead="Drafts, notes waiting for review, and what you have published.">Your notes</PageHeading>
      <Button variant="contained" component={RouterLink} to={paths.newFieldNote.href()} sx={{ alignSelf: 'flex-start' }}>
        Write a note
      </Button>
      <Listing notes={data?.myFieldNotes} loading={loading} error={error} empty='You have not written a note yet. Start with "Write a note": drafts stay private until you send them for review.' />
    </Stack>
  );
}

/** Notes waiting for an administrator. */
export function FieldNotesReviewPage() {
  const { data, loading, error } = useQuery(docs.reviewQueue, WORKING_COPY);
  return (
    <Stack spacing={3}>
      <PageHeading lead="Open a note to publish it or send it back with a comment. A finding is never published by the person who wrote it.">Review queue</PageHeading>
      <Listing notes={data?.fieldNoteReviewQueue} loading={loading} error={error} empty="Nothing is waiting for review. Notes appear here when their authors send them in." />
    </Stack>
  );
}
