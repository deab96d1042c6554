import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink, useParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { fieldNotesDocuments as docs } from '../../../features/field-notes/api/field-notes-documents.js';
import { NoteHistory } from '../../../features/field-notes/components/note-history.js';
import { WORKING_COPY } from '../../../features/field-notes/lib/note-labels.js';

export function FieldNoteHistoryPage() {
  const { slug = '' } = useParams();
  const note = useQuery(docs.fieldNote, { variables: { slug, draft: true }, ...WORKING_COPY });
  const id = note.data?.fieldNote.id;
  const history = useQuery(docs.history, { variables: { id: id ?? '' }, skip: !id, ...WORKING_COPY });
  if (note.loading || history.loading) return <PageLoading label="Loading the revisions" />;
  const error = note.error ?? history.error;
  if (error || !history.data) return <Alert severity="error" role="alert">The revisions could not be loaded{error ? `: ${error.message}` : '.'}</Alert>;
  return (
    <Stack spacing={3}>
      <PageHeading lead="Every saved revision is kept. Pick two to see what changed.">{`Revisions: ${history.data.fieldNoteHistory.note.title}`}</PageHeading>
      <Button component={RouterLink} to={paths.fieldNote.href(slug, { draft: true })} sx={{ alignSelf: 'flex-start' }}>
        Back to the note
      </Button>
      <NoteHistory history={history.data.fieldNoteHistory} />
    </Stack>
  );
}
