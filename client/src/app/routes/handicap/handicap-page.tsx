import { useMutation, useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { Link as RouterLink, useParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { handicapDocuments } from '../../../features/insights/api/handicap-documents.js';
import { HandicapSheetView } from '../../../features/insights/components/handicap-sheet-view.js';

/** The organiser's handicap sheet for one meet event. */
export function HandicapPage() {
  const { meetId = '', meetEventId = '' } = useParams();
  const { user } = useAuth();
  const { data, loading, error } = useQuery(handicapDocuments.sheet, { variables: { meetEventId } });
  const [save, saved] = useMutation(handicapDocuments.save);
  const [done, setDone] = useState(false);
  const sheet = saved.data?.setHandicapMarks ?? data?.handicapMarks;
  return (
    <Stack spacing={2}>
      <PageHeading lead="Expected times from each athlete's past results, the start mark that follows, and your own marks where you know better.">Handicap marks</PageHeading>
      <Link component={RouterLink} to={paths.meet.href(meetId)} className="handicap-screen-only" sx={{ alignSelf: 'flex-start', py: 1 }}>Back to the meet</Link>
      {loading && <PageLoading />}
      {error && <Alert severity="error">Could not load the marks: {error.message}</Alert>}
      {saved.error && <Alert severity="error">The marks were not saved: {saved.error.message}</Alert>}
      {done && !saved.error && <Alert severity="success" onClose={() => setDone(false)}>Marks saved.</Alert>}
      {sheet && (
        <HandicapSheetView
          key={saved.data ? 'saved' : 'loaded'}
          sheet={sheet}
          imperial={user?.unitSystem === 'IMPERIAL'}
          saving={saved.loading}
          onSave={(marks) => void save({ variables: { meetEventId, marks } }).then(() => setDone(true), () => setDone(false))}
        />
      )}
    </Stack>
  );
}
