import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Chip from '@mui/material/Chip';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import type { ClubInvitation } from '../api/types.js';

const day = (iso: string) => new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

function state(invitation: ClubInvitation, now: number): { label: string; detail: string; pending: boolean } {
  if (invitation.acceptedAt) return { label: 'Joined', detail: `accepted ${day(invitation.acceptedAt)}`, pending: false };
  if (new Date(invitation.expiresAt).getTime() < now) return { label: 'Expired', detail: `expired ${day(invitation.expiresAt)}; send a new one`, pending: false };
  return { label: 'Waiting', detail: `link works until ${day(invitation.expiresAt)}`, pending: true };
}

/** Invitations sent by the club, waiting ones first. */
export function InvitationsList({ clubId, now = Date.now() }: { clubId: string; now?: number }) {
  const { data, loading, error } = useQuery(clubsDocuments.clubInvitations, { variables: { clubId } });
  if (loading && !data) return <PageLoading label="Loading invitations" />;
  if (error || !data) return <Alert severity="error">{graphQLErrorDetails(error)[0]?.message}</Alert>;
  if (data.clubInvitations.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>No invitations sent yet. Invite a coach or an athlete by e-mail above.</Typography>;
  }
  const rows = data.clubInvitations.map((invitation) => ({ invitation, ...state(invitation, now) }));
  rows.sort((a, b) => Number(b.pending) - Number(a.pending));
  return (
    <List dense aria-label="Invitations">
      {rows.map(({ invitation, label, detail, pending }) => (
        <ListItem key={invitation.id} disableGutters secondaryAction={<Chip size="small" label={label} color={pending ? 'primary' : 'default'} variant={pending ? 'filled' : 'outlined'} />}>
          <ListItemText
            primary={invitation.email}
            secondary={`${invitation.role === 'COACH' ? 'Coach' : 'Athlete'} · ${detail}`}
            slotProps={{ primary: { sx: { overflowWrap: 'anywhere', pr: 10 } } }}
          />
        </ListItem>
      ))}
    </List>
  );
}
