import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import Box from '@mui/material/Box';
import Add from '@mui/icons-material/Add';
import Button from '@mui/material/Button';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import { NoticeToast } from '../../../components/ui/notice-toast.js';
import type { Club } from '../api/types.js';
import { ClubColours } from './club-colours.js';
import { ClubFormDialog } from './club-form-dialog.js';

/** Every club in the league; the member's own clubs first and marked. Administrators add clubs here. */
export function ClubsList({ myClubIds, canAdd = false }: { myClubIds: readonly string[]; canAdd?: boolean }) {
  const { data, loading, error } = useQuery(clubsDocuments.clubs);
  const [adding, setAdding] = useState(false);
  const [notice, setNotice] = useState<string>();
  if (loading && !data) return <PageLoading label="Loading clubs" />;
  if (error || !data) return <Alert severity="error" role="alert">{graphQLErrorDetails(error)[0]?.message}</Alert>;
  const mine = (id: string) => myClubIds.includes(id);
  const clubs = [...data.clubs].sort((a, b) => Number(mine(b.id)) - Number(mine(a.id)));
  return (
    <Stack spacing={2}>
      {canAdd && (
        <Button variant="contained" startIcon={<Add />} onClick={() => setAdding(true)} sx={{ alignSelf: 'flex-start' }}>
          Add a club
        </Button>
      )}
      {clubs.length === 0 && (
        <Alert severity="info">{canAdd ? 'No clubs yet. Add the first one.' : 'No clubs yet. The league administrator adds clubs; ask them to add yours.'}</Alert>
      )}
      {clubs.length > 0 && <ClubCards clubs={clubs} mine={mine} />}
      {adding && <ClubFormDialog onClose={() => setAdding(false)} onDone={setNotice} />}
      <NoticeToast message={notice} onClose={() => setNotice(undefined)} />
    </Stack>
  );
}

function ClubCards({ clubs, mine }: { clubs: Club[]; mine: (id: string) => boolean }) {
  return (
    <Box component="ul" sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr', lg: '1fr 1fr 1fr' } }}>
      {clubs.map((club) => (
        <Card key={club.id} component="li" variant="outlined">
          <CardActionArea component={RouterLink} to={paths.club.href(club.id)} sx={{ height: '100%' }}>
            <CardContent>
              <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center' }}>
                <ClubColours primary={club.colourPrimary} secondary={club.colourSecondary} />
                <Box sx={{ minWidth: 0, flex: 1 }}>
                  <Typography component="h2" variant="h3" sx={{ fontSize: '1.125rem' }}>
                    {club.name}
                  </Typography>
                  <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                    {club.shortName} · {club.region} · {club.athleteCount} {club.athleteCount === 1 ? 'athlete' : 'athletes'}
                  </Typography>
                </Box>
                {mine(club.id) && <Chip size="small" color="primary" label="Your club" />}
              </Stack>
            </CardContent>
          </CardActionArea>
        </Card>
      ))}
    </Box>
  );
}
