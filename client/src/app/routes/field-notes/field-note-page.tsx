import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink, useParams, useSearchParams } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { fieldNotesDocuments as docs } from '../../../features/field-notes/api/field-notes-documents.js';
import { NoteView } from '../../../features/field-notes/components/note-view.js';
import { WORKING_COPY } from '../../../features/field-notes/lib/note-labels.js';
import { hasErrorCode } from '../../../lib/graphql-error-details.js';

export function FieldNotePage() {
  const { slug = '' } = useParams();
  const [params] = useSearchParams();
  const { user, status } = useAuth();
  const draft = params.get('draft') === '1';
  // Drafts are only for their author and reviewers; the server answers "not found" to everyone else.
  const { data, loading, error, refetch } = useQuery(docs.fieldNote, {
    variables: { slug, draft },
    skip: status === 'loading',
    ...(draft ? WORKING_COPY : {}),
  });

  if (loading || status === 'loading') return <PageLoading label="Loading the note" />;
  if (error) {
    const missing = hasErrorCode(error, 'NOT_FOUND');
    return (
      <Stack spacing={2} sx={{ alignItems: 'flex-start' }}>
        <Alert severity={missing ? 'info' : 'error'} role="alert">
          {missing ? 'There is no published note at this address. It may have been withdrawn, or it is still a draft.' : `The note could not be loaded: ${error.message}`}
        </Alert>
        <Button component={RouterLink} to={paths.fieldNotes.href()} variant="outlined">
          Browse Field Notes
        </Button>
      </Stack>
    );
  }
  if (!data) return null;
  return <NoteView note={data.fieldNote} signedIn={user !== null} onChanged={() => refetch()} />;
}
