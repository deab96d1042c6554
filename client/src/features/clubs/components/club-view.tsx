import { useQuery } from '@apollo/client/react';
import Edit from '@mui/icons-material/Edit';
import PersonAdd from '@mui/icons-material/PersonAdd';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';

import { NoticeToast } from '../../../components/ui/notice-toast.js';
import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { SectionCard } from '../../../components/ui/section-card.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import type { Athlete } from '../api/types.js';
import { AthleteFormDialog } from './athlete-form-dialog.js';
import { ClubColours } from './club-colours.js';
import { ClubFormDialog } from './club-form-dialog.js';
import { InvitationsList } from './invitations-list.js';
import { InviteForm } from './invite-form.js';
import { RosterGrid } from './roster-grid.js';

export function ClubView({ clubId }: { clubId: string }) {
  const { data, loading, error } = useQuery(clubsDocuments.club, { variables: { id: clubId } });
  const [editing, setEditing] = useState<{ athlete?: Athlete } | null>(null);
  const [editingClub, setEditingClub] = useState(false);
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
      {club.canManage && (
        <Button variant="outlined" startIcon={<Edit />} onClick={() => setEditingClub(true)} sx={{ alignSelf: 'flex-start' }}>
          Edit club details
        </Button>
      )}
      {club.contactEmail && (
        <Typography>
          Contact: <Link href={`mailto:${club.contactEmail}`}>{club.contactEmail}</Link>
        </Typography>
      )}
      <SectionCard
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
      </SectionCard>
      {club.canManage && (
        <SectionCard title="Invite to the club">
          <Stack spacing={3}>
            <InviteForm clubId={club.id} clubName={club.name} />
            <div>
              <Typography variant="h3" component="h3" sx={{ mb: 1 }}>
                Invitations sent
              </Typography>
              <InvitationsList clubId={club.id} />
            </div>
          </Stack>
        </SectionCard>
      )}
      {editing && <AthleteFormDialog clubId={club.id} athlete={editing.athlete} onClose={() => setEditing(null)} onDone={setNotice} />}
      {editingClub && <ClubFormDialog club={club} onClose={() => setEditingClub(false)} onDone={setNotice} />}
      <NoticeToast message={notice} onClose={() => setNotice(undefined)} />
    </Stack>
  );
}
