import { useQuery } from '@apollo/client/react';
import { DIVISION_LABELS } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useSearchParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { SafetyNote } from '../../../components/ui/safety-note.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { UnitPreference } from '../api/types.js';
import { formatDiameter } from '../lib/format-result.js';
import { ResultsEntryTable } from './results-entry-table.js';
import { SheetUpload } from './sheet-upload.js';
import { TimekeepersPanel } from './timekeepers-panel.js';

/** The organiser's meet-day screen: pick an event, type its results, or upload the whole sheet. */
export function PostResultsView({ meetId, units }: { meetId: string; units: UnitPreference }) {
  const [params, setParams] = useSearchParams();
  const { data, error, loading } = useQuery(resultsDocuments.meetResults, { variables: { meetId }, fetchPolicy: 'cache-and-network' });
  if (loading && !data) return <PageLoading label="Loading the meet's entries" />;
  if (error || !data) return <Alert severity="error">{graphQLErrorDetails(error)[0]?.message}</Alert>;
  const meet = data.meetResults;
  if (!meet.canPublish && !meet.asTimekeeper) {
    return (
      <Stack spacing={2}>
        <PageHeading>{`Post results: ${meet.meetName}`}</PageHeading>
        <Alert severity="info">Only organisers and the timekeepers they appoint for this meet post its results.</Alert>
        <Button component={RouterLink} to={paths.meetResults.href(meetId)} variant="outlined" sx={{ alignSelf: 'flex-start' }}>See the results page</Button>
      </Stack>
    );
  }
  const event = meet.events.find((e) => e.meetEventId === params.get('event')) ?? meet.events[0];
  const waitingNote = meet.asTimekeeper && meet.published
    ? 'These results are published; the meet’s organisers make any corrections.'
    : 'Results can be posted once the meet has closed its entries.';
  return (
    <Stack spacing={3}>
      <PageHeading lead={meet.published ? 'These results are published: each change is a correction with a reason, kept on record.' : 'Type each run as the watches read, or upload the timekeepers’ sheet. Place and points are worked out for you.'}>
        {`Post results: ${meet.meetName}`}
      </PageHeading>
      <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap' }}>
        <Button component={RouterLink} to={paths.meetResults.href(meetId)} variant="outlined">See the results page</Button>
      </Stack>
      {!meet.canRecord && <Alert severity="info">{waitingNote}</Alert>}
      <SafetyNote title="On the course">
        Keep timekeepers and judges outside the clear zone while axes swing; edges sheathed between heats; stop the event for a loose head
        or cracked handle. The sanctioning body’s rules and the meet director’s call come first.
      </SafetyNote>
      {meet.canRecord && !meet.published && <SheetUpload meetId={meetId} />}
      {meet.events.length === 0 ? (
        <Typography>This meet has no events yet. Add them on the meet page.</Typography>
      ) : (
        <>
          <Tabs
            value={event?.meetEventId ?? false}
            onChange={(_, value: string) => setParams({ event: value }, { replace: true })}
            variant="scrollable"
            scrollButtons="auto"
            aria-label="Event"
          >
            {meet.events.map((e) => (
              <Tab key={e.meetEventId} value={e.meetEventId} label={`${e.eventName} · ${DIVISION_LABELS[e.division]}`} sx={{ minHeight: 48 }} />
            ))}
          </Tabs>
          {event && (
            <Stack spacing={1}>
              <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                {[event.speciesName, event.diameterMm === null ? null : formatDiameter(event.diameterMm, units)].filter(Boolean).join(', ')}
                {event.timeLimitHundredths !== null && ` · time limit ${event.timeLimitHundredths / 100} s`}
                {' · '}
                {event.results.length} of {event.results.length + event.waiting.length} posted. Enter saves a row and moves down.
              </Typography>
              {meet.canRecord && <ResultsEntryTable key={event.meetEventId} event={event} units={units} published={meet.published} />}
            </Stack>
          )}
        </>
      )}
      {meet.canPublish && !meet.published && <TimekeepersPanel meetId={meetId} />}
    </Stack>
  );
}
