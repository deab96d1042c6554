import { useMutation, useQuery } from '@apollo/client/react';
import Add from '@mui/icons-material/Add';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';

import { NoticeToast } from '../../../components/ui/notice-toast.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { meetsDocuments } from '../api/meets-documents.js';
import type { Entry, MeetEvent, UnitPreference } from '../api/types.js';
import { eventTitle } from '../lib/event-title.js';
import { meetActions } from '../lib/meet-actions.js';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog.js';
import { DrawOrderDialog } from './draw-order-dialog.js';
import { EnterHint } from './enter-hint.js';
import { EntryPickerDialog } from './entry-picker-dialog.js';
import { EventFormDialog } from './event-form-dialog.js';
import { LineupLinks } from './lineup-links.js';
import { MeetChanges } from './meet-changes.js';
import { ResultsLinks } from './results-links.js';
import { MeetDaySafety } from './meet-day-safety.js';
import { MeetEventCard } from './meet-event-card.js';
import { MeetHeader } from './meet-header.js';
import { MeetOrganiserBar } from './meet-organiser-bar.js';
import { MeetScoringSummary } from './meet-scoring.js';
import { useCarriedNotice } from '../../../lib/use-carried-notice.js';

/** Statuses in which a meet has results, so its scoring changes are on record. */
const HAS_RESULTS = ['RUNNING', 'PUBLISHED', 'ARCHIVED'];

type OpenDialog =
  | { kind: 'event'; event?: MeetEvent }
  | { kind: 'remove' | 'draw' | 'enter'; event: MeetEvent }
  | { kind: 'withdraw'; event: MeetEvent; entry: Entry };

export interface MeetViewProps {
  meetId: string;
  units: UnitPreference;
  /** Clubs the member belongs to; their entries stand out. */
  ownClubIds: readonly string[];
}

export function MeetView({ meetId, units, ownClubIds }: MeetViewProps) {
  const [dialog, setDialog] = useState<OpenDialog | null>(null);
  // The builder's message, shown once.
  const [notice, setNotice] = useCarriedNotice();
  // Other clubs enter while this page is open elsewhere: show the cache, then refresh it.
  const { data, error, loading, refetch } = useQuery(meetsDocuments.meet, { variables: { id: meetId }, fetchPolicy: 'cache-and-network' });
  const enterable = data?.meet.enterableClubIds ?? [];
  const options = useQuery(meetsDocuments.leagueOptions, { skip: enterable.length === 0 });
  const again = { refetchQueries: [{ query: meetsDocuments.meet, variables: { id: meetId } }], awaitRefetchQueries: true };
  const [removeEvent] = useMutation(meetsDocuments.removeMeetEvent, again);
  const [withdraw] = useMutation(meetsDocuments.withdrawEntry, again);

  if (loading && !data) return <PageLoading label="Loading the meet" />;
  if (error || !data) {
    const notFound = graphQLErrorDetails(error).some((detail) => detail.code === 'NOT_FOUND');
    return (
      <Alert severity={notFound ? 'info' : 'error'} role="alert" action={!notFound && <Button onClick={() => void refetch()}>Try again</Button>}>
        {notFound ? 'This meet does not exist, or it is still being built and not public yet. ' : graphQLErrorDetails(error)[0]?.message}{' '}
        {notFound && <Link component={RouterLink} to={paths.meets.href()}>See all meets</Link>}
      </Alert>
    );
  }

  const meet = data.meet;
  const actions = meetActions(meet);
  const clubs = (options.data?.clubs ?? []).filter((club) => enterable.includes(club.id));
  const sorted = [...meet.events].sort((a, b) => a.position - b.position);
  // A dialog keeps working on the event as refetched (new entries show as already entered).
  const live = dialog?.event ? (meet.events.find((event) => event.id === dialog.event?.id) ?? dialog.event) : undefined;

  return (
    <Stack spacing={3}>
      <MeetHeader meet={meet} />
      {meet.canManage && <MeetOrganiserBar meet={meet} actions={actions} onNotice={setNotice} />}
      {enterable.length > 0 && <EnterHint meet={meet} clubs={clubs} />}
      <LineupLinks meet={meet} />
      <ResultsLinks meet={meet} />
      <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', md: 'minmax(0, 2fr) minmax(0, 1fr)' }, alignItems: 'start' }}>
        <Stack component="section" aria-labelledby="meet-events" spacing={2}>
          <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', gap: 1, flexWrap: 'wrap' }}>
            <Typography id="meet-events" variant="h2">
              Events
            </Typography>
            {actions.editEvents && (
              <Button variant="contained" startIcon={<Add />} onClick={() => setDialog({ kind: 'event' })}>
                Add event
              </Button>
            )}
          </Stack>
          {sorted.length === 0 && (
            <Typography sx={{ color: 'text.secondary' }}>
              {actions.editEvents
                ? 'No events yet. Add the first one: pick it from the catalogue, then set the division, block species and diameter.'
                : 'The organiser has not added the events yet.'}
            </Typography>
          )}
          {sorted.map((event) => (
            <MeetEventCard
              key={event.id}
              event={event}
              units={units}
              actions={actions}
              ownClubIds={ownClubIds}
              onEnter={(chosen) => setDialog({ kind: 'enter', event: chosen })}
              onEdit={(chosen) => setDialog({ kind: 'event', event: chosen })}
              onRemove={(chosen) => setDialog({ kind: 'remove', event: chosen })}
              onDraw={(chosen) => setDialog({ kind: 'draw', event: chosen })}
              onWithdraw={(entry, chosen) => setDialog({ kind: 'withdraw', event: chosen, entry })}
            />
          ))}
        </Stack>
        <Stack spacing={3}>
          <MeetDaySafety />
          <MeetScoringSummary meet={meet} />
          {meet.canManage && HAS_RESULTS.includes(meet.status) && <MeetChanges meetId={meet.id} meet={meet} />}
        </Stack>
      </Box>

      {dialog?.kind === 'event' && (
        <EventFormDialog meet={meet} event={dialog.event} units={units} onClose={() => setDialog(null)} onSaved={setNotice} />
      )}
      {dialog?.kind === 'draw' && live && <DrawOrderDialog event={live} onClose={() => setDialog(null)} onDrawn={setNotice} />}
      {dialog?.kind === 'enter' && live && <EntryPickerDialog event={live} clubs={clubs} onClose={() => setDialog(null)} />}
      {dialog?.kind === 'remove' && (
        <ConfirmDialog
          open
          title={`Remove ${eventTitle(dialog.event)}?`}
          confirmLabel="Remove event"
          destructive
          onClose={() => setDialog(null)}
          onConfirm={async () => {
            await removeEvent({ variables: { id: dialog.event.id } });
            setNotice(`${eventTitle(dialog.event)} removed.`);
          }}
        >
          The event and its {dialog.event.entries.length} {dialog.event.entries.length === 1 ? 'entry' : 'entries'} will be removed from the meet.
        </ConfirmDialog>
      )}
      {dialog?.kind === 'withdraw' && (
        <ConfirmDialog
          open
          title={`Withdraw ${dialog.entry.label}?`}
          confirmLabel="Withdraw"
          destructive
          onClose={() => setDialog(null)}
          onConfirm={async () => {
            await withdraw({ variables: { entryId: dialog.entry.id } });
            setNotice(`${dialog.entry.label} withdrawn from ${eventTitle(dialog.event)}.`);
          }}
        >
          {dialog.entry.label} ({dialog.entry.clubName}) will no longer compete in {eventTitle(dialog.event)}.
        </ConfirmDialog>
      )}
      <NoticeToast message={notice} onClose={() => setNotice(undefined)} />
    </Stack>
  );
}
