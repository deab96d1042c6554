import { useMutation } from '@apollo/client/react';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';

import { paths } from '../../../config/paths.js';
import { meetsDocuments } from '../api/meets-documents.js';
import type { MeetDetail } from '../api/types.js';
import type { MeetActions } from '../lib/meet-actions.js';
import { statusMoves, type StatusMove } from '../lib/status-moves.js';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog.js';

export interface MeetOrganiserBarProps {
  meet: MeetDetail;
  actions: MeetActions;
  onNotice: (message: string) => void;
}

/** Status moves, editing and deleting, each hard-to-undo step behind a confirmation. */
export function MeetOrganiserBar({ meet, actions, onNotice }: MeetOrganiserBarProps) {
  const navigate = useNavigate();
  const [move, setMove] = useState<StatusMove>();
  const [deleting, setDeleting] = useState(false);
  const [setStatus] = useMutation(meetsDocuments.setMeetStatus, {
    refetchQueries: [{ query: meetsDocuments.meet, variables: { id: meet.id } }],
    awaitRefetchQueries: true,
  });
  const [deleteMeet] = useMutation(meetsDocuments.deleteMeet, { refetchQueries: ['Meets'] });

  return (
    <Paper component="section" variant="outlined" aria-labelledby="meet-organiser" sx={{ p: { xs: 2, sm: 2.5 } }}>
      <Typography id="meet-organiser" variant="h3" component="h2" sx={{ mb: 1.5 }}>
        Run this meet
      </Typography>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
        {statusMoves(meet.status).map((candidate) => (
          <Button
            key={candidate.to}
            variant={candidate.to === 'ARCHIVED' || candidate.to === 'DRAFT' ? 'outlined' : 'contained'}
            onClick={() => setMove(candidate)}
          >
            {candidate.action}
          </Button>
        ))}
        {meet.status !== 'ARCHIVED' && (
          <Button component={RouterLink} to={paths.editMeet.href(meet.id)} variant="outlined">
            Edit meet details
          </Button>
        )}
        {actions.deleteMeet && (
          <Button color="error" onClick={() => setDeleting(true)}>
            Delete meet
          </Button>
        )}
      </Stack>
      {move && (
        <ConfirmDialog
          open
          title={`${move.action}?`}
          confirmLabel={move.action}
          destructive={move.to === 'ARCHIVED'}
          onClose={() => setMove(undefined)}
          onConfirm={async () => {
            await setStatus({ variables: { id: meet.id, status: move.to } });
            onNotice(`${meet.name}: ${move.action.toLowerCase()} done.`);
          }}
        >
          {move.consequence}
        </ConfirmDialog>
      )}
      <ConfirmDialog
        open={deleting}
        title="Delete this meet?"
        confirmLabel="Delete meet"
        destructive
        onClose={() => setDeleting(false)}
        onConfirm={async () => {
          await deleteMeet({ variables: { id: meet.id } });
          void navigate(paths.meets.href(), { replace: true });
        }}
      >
        {meet.name} and its {meet.eventCount} {meet.eventCount === 1 ? 'event' : 'events'} and {meet.entryCount}{' '}
        {meet.entryCount === 1 ? 'entry' : 'entries'} will be deleted for good. To keep it for the record, archive it
        instead.
      </ConfirmDialog>
    </Paper>
  );
}
