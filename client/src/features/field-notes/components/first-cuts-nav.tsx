import { useQuery } from '@apollo/client/react';
import ArrowForwardIcon from '@mui/icons-material/ArrowForward';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import { fieldNotesDocuments as docs } from '../api/field-notes-documents.js';

/** "Step 3 of 7" and the way on to the next guide, for a note that is part of First Cuts. */
export function FirstCutsNav({ noteId }: { noteId: string }) {
  const { data } = useQuery(docs.firstCuts);
  const steps = data?.firstCuts.steps ?? [];
  const index = steps.findIndex((s) => s.note.id === noteId);
  if (index < 0) return null;
  const next = steps[index + 1];
  return (
    <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5} sx={{ alignItems: { sm: 'center' } }}>
      <Typography variant="body2" color="text.secondary">
        First Cuts · step {index + 1} of {steps.length}
      </Typography>
      <Button component={RouterLink} to={paths.firstCuts.href()} size="large">
        All steps
      </Button>
      {next && (
        <Button component={RouterLink} to={paths.fieldNote.href(next.note.slug)} endIcon={<ArrowForwardIcon />} size="large" variant="outlined">
          Next: {next.note.title}
        </Button>
      )}
    </Stack>
  );
}
