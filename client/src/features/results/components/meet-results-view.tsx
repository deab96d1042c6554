import { useQuery } from '@apollo/client/react';
import { MEET_STATUS_LABELS } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Snackbar from '@mui/material/Snackbar';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { MeetResults, UnitPreference } from '../api/types.js';
import { formatDay } from '../lib/format-day.js';
import { EventResultsTable } from './event-results-table.js';
import { PublishResultsButton } from './publish-results-button.js';
import { ResultsChangeLog } from './results-change-log.js';

/** A meet's results, event by event; organisers also get posting and publishing here. */
export function MeetResultsView({ meetId, units }: { meetId: string; units: UnitPreference }) {
  const [notice, setNotice] = useState<string>();
  const { data, error, loading, refetch } = useQuery(resultsDocuments.meetResults, { variables: { meetId }, fetchPolicy: 'cache-and-network' });
  if (loading && !data) return <PageLoading label="Loading the results" />;
  if (error || !data) {
    const notFound = graphQLErrorDetails(error).some((detail) => detail.code === 'NOT_FOUND');
    return (
      <Alert severity={notFound ? 'info' : 'error'} role="alert" action={!notFound && <Button onClick={() => void refetch()}>Try again</Button>}>
        {notFound ? 'This meet does not exist, or it is not public yet. ' : graphQLErrorDetails(error)[0]?.message}{' '}
        <Link component={RouterLink} to={paths.results.href()}>Browse all results</Link>
      </Alert>
    );
  }
  const meet = data.meetResults;
  const posted = meet.events.some((e) => e.results.length > 0);
  return (
    <Stack spacing={3}>
      <PageHeading lead={`${formatDay(meet.startsOn)} · ${meet.venue} · ${meet.seasonName}`}>{`Results: ${meet.meetName}`}</PageHeading>
      <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap', alignItems: 'center' }}>
        <Chip label={meet.published ? 'Results out' : MEET_STATUS_LABELS[meet.status]} color={meet.published ? 'primary' : 'default'} />
        <Button component={RouterLink} to={paths.meet.href(meet.meetId)}>Meet page</Button>
        {meet.canRecord && (
          <Button variant={meet.published ? 'outlined' : 'contained'} component={RouterLink} to={paths.postResults.href(meet.meetId)}>
            {meet.published ? 'Correct results' : 'Post results'}
          </Button>
        )}
        {meet.canPublish && meet.status === 'RUNNING' && posted && (
          <PublishResultsButton meetId={meet.meetId} meetName={meet.meetName} onPublished={setNotice} />
        )}
      </Stack>
      {!meet.published && !meet.canRecord && (
        <Alert severity="info">Results for this meet are not out yet. They appear here as soon as the organiser publishes them.</Alert>
      )}
      {meet.canRecord && !meet.published && (
        <Alert severity="info">
          Only organisers and this meet's timekeepers see these results until they are published.
          {!posted && ' Post them event by event, or upload the timekeepers’ sheet.'}
        </Alert>
      )}
      {meet.events.map((event) => (
        <EventResultsTable key={event.meetEventId} event={event} units={units} />
      ))}
      {meet.published && meet.events.length === 0 && <Typography>No events in this meet.</Typography>}
      {meet.canPublish && posted && <ResultsChangeLog meetId={meet.meetId} labels={entryLabels(meet)} />}
      <Snackbar open={Boolean(notice)} autoHideDuration={8000} onClose={() => setNotice(undefined)} message={notice} />
    </Stack>
  );
}

/** "Ansel Birchfield, Underhand chop" for each entry id, for the change log. */
function entryLabels(meet: MeetResults): Map<string, string> {
  const labels = new Map<string, string>();
  for (const e of meet.events) {
    for (const r of e.results) labels.set(r.entryId, `${r.label}, ${e.eventName}`);
    for (const w of e.waiting) labels.set(w.id, `${w.label}, ${e.eventName}`);
  }
  return labels;
}
