import { canRunMeets } from '@endgrain/shared';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { MeetsList } from '../../../features/meets/components/meets-list.js';

export function MeetsListPage() {
  const { user } = useAuth();
  return (
    <Stack spacing={1}>
      <PageHeading lead="Meets in the league: when and where, who hosts, and whether entries are open.">Meets</PageHeading>
      <MeetsList canRunMeets={canRunMeets(user)} />
      <Button component={RouterLink} to={paths.clubs.href()} sx={{ alignSelf: 'flex-start', mt: 2 }}>
        Clubs and rosters
      </Button>
    </Stack>
  );
}
