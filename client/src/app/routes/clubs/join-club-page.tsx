import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useLocation, useSearchParams } from 'react-router';

import { NarrowPage } from '../../../components/layouts/narrow-page.js';
import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { JoinClub } from '../../../features/clubs/components/join-club.js';

/** The invitation e-mail's link: sign in or sign up first (coming back here), then accept. */
export function JoinClubPage() {
  const { status, user } = useAuth();
  const [params] = useSearchParams();
  const location = useLocation();
  const back = location.pathname + location.search;

  return (
    <NarrowPage>
      <PageHeading compact>Join a club</PageHeading>
      {status === 'loading' ? (
        <PageLoading label="Checking your sign-in" />
      ) : user ? (
        <JoinClub token={params.get('token') ?? ''} email={user.email} />
      ) : (
        <Stack spacing={2.5}>
          <Typography>
            A club has invited you to Endgrain. Sign in, or create an account with the address the invitation was sent to, and
            you will come straight back here to accept it.
          </Typography>
          <Button component={RouterLink} to={paths.auth.signUp.href(back)} variant="contained" size="large">
            Create account
          </Button>
          <Button component={RouterLink} to={paths.auth.signIn.href(back)} variant="outlined" size="large">
            Sign in
          </Button>
        </Stack>
      )}
    </NarrowPage>
  );
}
