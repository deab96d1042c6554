import { useQuery } from '@apollo/client/react';
import PersonAdd from '@mui/icons-material/PersonAdd';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Snackbar from '@mui/material/Snackbar';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState, type ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import type { Athlete } from '../api/types.js';
import { AthleteFormDialog } from './athlete-form-dialog.js';
import { ClubColours } from './club-colours.js';
import { InvitationsList } from './invitations-list.js';
import { InviteForm } from './invite-form.js';
import { RosterGrid } from './roster-grid.js';

function Section({ title, action, children }: { title: string; action?: ReactNode; children: ReactNode }) {
  return (
    <Paper component="section" variant="outlined" aria-label={title} sx={{ p: { xs: 2, sm: 3 } }}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', gap: 1, mb: 2, flexWrap: 'wrap' }}>
        <Typography variant="h2">{title}</Typography>
        {action}
      </Stack>
      {children}
    </Paper>
  );
}

export function ClubView({ clubId }: { clubId: string }) {
  const { data, loading, error } = useQuery(clubsDocuments.club, { variables: { id: clubId } });
  const [editing, setEditing] = useState<{ athlete?: Athlete } | null>(null);
  const [notice, setNotice] = useState<string>();

  if (loading && !data) return <PageLoading label="Loading the club" />;
  if (error || !data) {
    const notFound = graphQLErrorDetails(error).some((detail) => detail.code === 'NOT_FOUND');
    return (
      <Alert severity={notFound ? 'info' : 'error'} role="alert">
        {notFound ? 'There is no such club. ' : graphQLErrorDetails(error)[0]?.message}{' '}
        <Link component={RouterLink} to={paths.clubs.href()}>See all clubs</Link>
      </Alert>
    );
  }
  const club = data.club;
  return (
    <Stack spacing={3}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
        <ClubColours primary={club.colourPrimary} secondary={club.colourSecondary} size={48} />
        <PageHeading lead={`${club.shortName} · ${club.region}`}>{club.name}</PageHeading>
      </Stack>
      {club.contactEmail && (
        <Typography>
          Contact: <Link href={`mailto:${club.contactEmail}`}>{club.contactEmail}</Link>
        </Typography>
      )}
      <Section
        title={`Roster (${club.roster.length})`}
        action={
          club.canManage && (
            <Button variant="contained" startIcon={<PersonAdd />} onClick={() => setEditing({})}>
              Add athlete
            </Button>
          )
        }
      >
        {club.roster.length === 0 ? (
          <Typography sx={{ color: 'text.secondary' }}>
            {club.canManage
              ? 'Nobody on the roster yet. Add your athletes here; they do not need an account to be entered in meets.'
              : 'This club has not listed any athletes yet.'}
          </Typography>
        ) : (
          <RosterGrid roster={club.roster} onEdit={club.canManage ? (athlete) => setEditing({ athlete }) : undefined} />
        )}
      </Section>
      {club.canManage && (
        <Section title="Invite to the club">
          <Stack spacing={3}>
            <InviteForm clubId={club.id} clubName={club.name} />
            <div>
              <Typography variant="h3" component="h3" sx={{ mb: 1 }}>
                Invitations sent
              </Typography>
              <InvitationsList clubId={club.id} />
            </div>
          </Stack>
        </Section>
      )}
      {editing && <AthleteFormDialog clubId={club.id} athlete={editing.athlete} onClose={() => setEditing(null)} onDone={setNotice} />}
      <Snackbar
        open={Boolean(notice)}
        autoHideDuration={6000}
        onClose={() => setNotice(undefined)}
        message={notice}
        // Above the phone's bottom bar, not over it.
        sx={{ bottom: { xs: 'calc(80px + env(safe-area-inset-bottom))', sm: 24 } }}
      />
    </Stack>
  );
}
