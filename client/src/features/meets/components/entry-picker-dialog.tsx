import { useMutation, useQuery } from '@apollo/client/react';
import { DIVISION_LABELS } from '@endgrain/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { meetsDocuments } from '../api/meets-documents.js';
import type { ClubOption, MeetEvent } from '../api/types.js';
import { eventTitle } from '../lib/event-title.js';
import { AthleteChecklist } from './athlete-checklist.js';
import { FormDialog } from '../../../components/ui/form-dialog.js';

export interface EntryPickerDialogProps {
  event: MeetEvent;
  /** Clubs the member may enter for (their own; every club for an admin). */
  clubs: ClubOption[];
  onClose: () => void;
}

function pickSchema(teamSize: number) {
  const message = teamSize === 1 ? 'Pick one athlete.' : `Pick ${teamSize} athletes for this entry.`;
  return z.object({ athleteIds: z.array(z.string()).length(teamSize, message) });
}
type Values = { athleteIds: string[] };

/**
 * Enters one athlete (or a pair or team) from a club's roster into a meet event. It stays open after
 * each entry so a coach can enter several in a row; the server's rule checks show beside the list.
 */
export function EntryPickerDialog({ event, clubs, onClose }: EntryPickerDialogProps) {
  const teamSize = event.eventType.teamSize;
  const [clubId, setClubId] = useState(clubs.length === 1 ? clubs[0]!.id : '');
  const [alert, setAlert] = useState<string>();
  const [entered, setEntered] = useState<string>();
  const [find, setFind] = useState('');
  const roster = useQuery(meetsDocuments.clubRoster, { variables: { id: clubId }, skip: !clubId });
  const [enter] = useMutation(meetsDocuments.enterMeetEvent, {
    refetchQueries: [{ query: meetsDocuments.meet, variables: { id: event.meetId } }],
    awaitRefetchQueries: true,
  });
  const { control, handleSubmit, setError, reset, formState } = useForm<Values>({
    resolver: zodResolver(pickSchema(teamSize)),
    defaultValues: { athleteIds: [] },
  });

  const submit = handleSubmit(async ({ athleteIds }) => {
    setAlert(undefined);
    setEntered(undefined);
    try {
      const { data } = await enter({ variables: { input: { meetEventId: event.id, clubId, athleteIds } } });
      setEntered(`Entered: ${data?.enterMeetEvent.label ?? 'done'}.`);
      reset({ athleteIds: [] });
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: ['athleteIds'] }));
    }
  });

  const athletes = roster.data?.club.roster ?? [];
  const inDivision = athletes.filter((athlete) => athlete.divisions.includes(event.division));
  const alreadyIn = new Set(event.entries.flatMap((entry) => entry.athletes.map((athlete) => athlete.id)));
  const outside = athletes.length - inDivision.length;
  // A long roster gets a name filter, so nobody scrolls a phone through thirty names.
  const searchable = inDivision.length > 12;
  const words = find.trim().toLowerCase();
  const shown = searchable && words ? inDivision.filter((athlete) => athlete.name.toLowerCase().includes(words)) : inDivision;

  return (
    <FormDialog
      title={`Enter athletes: ${eventTitle(event)}`}
      onClose={onClose}
      onSubmit={submit}
      submitLabel="Enter"
      submitting={formState.isSubmitting}
      fullScreenOnPhone
      cancelLabel="Done"
      submitDisabled={!roster.data}
      footerNote={entered && `${entered} Pick the next ${teamSize === 1 ? 'athlete' : 'entry'}, or choose Done.`}
    >
      <FormAlert message={alert} />
      {clubs.length > 1 && (
        <TextField select label="Club" value={clubId} onChange={(change) => { setClubId(change.target.value); reset({ athleteIds: [] }); }}>
          {clubs.map((club) => (
            <MenuItem key={club.id} value={club.id}>
              {club.name}
            </MenuItem>
          ))}
        </TextField>
      )}
      {clubId && roster.loading && <PageLoading label="Loading the roster" />}
      {roster.error && <FormAlert message="The roster could not be loaded. Close this and try again." />}
      {roster.data && (
        <>
          <Typography variant="body2">
            {teamSize === 1 ? 'Pick one athlete' : `Pick ${teamSize} athletes`} from the {DIVISION_LABELS[event.division]} division
            {event.eventType.mixedPair ? ' (one woman and one man)' : ''}.
          </Typography>
          {searchable && (
            <TextField
              label="Find an athlete"
              type="search"
              value={find}
              onChange={(change) => setFind(change.target.value)}
              slotProps={{ htmlInput: { autoComplete: 'off' } }}
            />
          )}
          <AthleteChecklist
            control={control}
            athletes={shown}
            emptyText={
              words
                ? `Nobody in this division has "${find.trim()}" in their name.`
                : 'Nobody on this roster competes in this division yet. Add athletes on the club page first.'
            }
            teamSize={teamSize}
            alreadyIn={alreadyIn}
            error={formState.errors.athleteIds?.message}
            label={`Athletes of ${roster.data.club.name}`}
          />
          {outside > 0 && (
            <Typography variant="body2" sx={{ color: 'text.secondary' }}>
              {outside} more {outside === 1 ? 'athlete is' : 'athletes are'} on the roster but not in the{' '}
              {DIVISION_LABELS[event.division]} division; a coach can change divisions on the club page.
            </Typography>
          )}
        </>
      )}
    </FormDialog>
  );
}
