import { useQuery } from '@apollo/client/react';
import { canReviewArticles, canWriteArticles } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { fieldNotesDocuments as docs } from '../../../features/field-notes/api/field-notes-documents.js';
import { NoteFilters } from '../../../features/field-notes/components/note-filters.js';
import { NoteGrid } from '../../../features/field-notes/components/note-grid.js';
import { useNoteFilter } from '../../../features/field-notes/lib/use-note-filter.js';

export function FieldNotesPage() {
  const { user } = useAuth();
  const { filter, setFilter, variables, active } = useNoteFilter();
  const { data, loading, error } = useQuery(docs.fieldNotes, { variables: { filter: variables } });
  const notes = data?.fieldNotes ?? [];
  const writer = canWriteArticles(user);

  return (
    <Stack spacing={3}>
      <PageHeading lead="Findings backed by the league's trials and results, guides for every level, and safety notes. Written by coaches, reviewed by the league.">
        Field Notes
      </PageHeading>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Button variant="outlined" component={RouterLink} to={paths.search.href()}>
          Search Field Notes
        </Button>
        {writer && (
          <Button variant="contained" component={RouterLink} to={paths.newFieldNote.href()}>
            Write a note
          </Button>
        )}
        {writer && (
          <Button component={RouterLink} to={paths.myFieldNotes.href()}>
            Your notes
          </Button>
        )}
        {canReviewArticles(user) && (
          <Button component={RouterLink} to={paths.fieldNotesReview.href()}>
            Review queue
          </Button>
        )}
      </Stack>
      <NoteFilters filter={filter} active={active} onChange={setFilter} />
      {loading && <PageLoading label="Loading Field Notes" />}
      {error && (
        <Alert severity="error" role="alert">
          Field Notes could not be loaded: {error.message}
        </Alert>
      )}
      {!loading && !error && notes.length === 0 && (
        <Paper variant="outlined" sx={{ p: 3 }}>
          <Typography>
            {active ? 'No published notes match these filters. Clear a filter, or try a search.' : 'Nothing is published yet.'}
            {writer ? ' Coaches can write the first one with "Write a note".' : ''}
          </Typography>
        </Paper>
      )}
      {notes.length > 0 && <NoteGrid notes={notes} hrefFor={(note) => paths.fieldNote.href(note.slug)} />}
    </Stack>
  );
}
