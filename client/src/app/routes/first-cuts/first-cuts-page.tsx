import { useQuery } from '@apollo/client/react';
import { canReviewArticles } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { SafetyNote } from '../../../components/ui/safety-note.js';
import { paths } from '../../../config/paths.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { fieldNotesDocuments as docs } from '../../../features/field-notes/api/field-notes-documents.js';
import { FirstCutsCurator } from '../../../features/field-notes/components/first-cuts-curator.js';
import { FirstCutsSteps } from '../../../features/field-notes/components/first-cuts-steps.js';

export function FirstCutsPage() {
  const { user } = useAuth();
  const [curating, setCurating] = useState(false);
  const { data, loading, error } = useQuery(docs.firstCuts, { fetchPolicy: 'cache-and-network' });
  const series = data?.firstCuts;

  return (
    <Stack spacing={3}>
      <PageHeading lead="New to the sport? Start here. Read the steps in order, then practise each one with your coach.">First Cuts</PageHeading>
      <SafetyNote title="Before anything else">
        Reading is not training. Learn every skill from a qualified coach, in person, with protective boots, leg and eye protection and a clear
        zone. Follow your sanctioning body's rules and local law.
      </SafetyNote>
      {loading && !series && <PageLoading label="Loading First Cuts" />}
      {error && <Alert severity="error" role="alert">First Cuts could not be loaded: {error.message}</Alert>}
      {series && !curating && series.steps.length === 0 && (
        <Paper variant="outlined" sx={{ p: 3 }}>
          <Typography>
            The series is empty for now. Meanwhile, browse the guides in{' '}
            <Link component={RouterLink} to={`${paths.fieldNotes.href()}?kind=GUIDE`}>
              Field Notes
            </Link>
            .
          </Typography>
        </Paper>
      )}
      {series && !curating && series.steps.length > 0 && <FirstCutsSteps series={series} signedIn={user !== null} />}
      {series && !user && series.steps.length > 0 && (
        <Typography variant="body2" color="text.secondary">
          <Link component={RouterLink} to={paths.auth.signIn.href(paths.firstCuts.href())}>
            Sign in
          </Link>{' '}
          to keep track of the steps you have read.
        </Typography>
      )}
      {series && canReviewArticles(user) && !curating && (
        <Button onClick={() => setCurating(true)} sx={{ alignSelf: 'flex-start' }}>
          Change the series
        </Button>
      )}
      {series && curating && <FirstCutsCurator series={series} onDone={() => setCurating(false)} />}
    </Stack>
  );
}
