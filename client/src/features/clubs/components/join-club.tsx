import { useMutation } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useNavigate } from 'react-router';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { clubsDocuments } from '../api/clubs-documents.js';

export interface JoinClubProps {
  token: string;
  /** The signed-in member's e-mail: the invitation must have been sent to it. */
  email: string;
}

/**
 * Accepts a club invitation for the signed-in member on an explicit press (a link opened twice
 * must not spend the one-time token by itself), then shows the club.
 */
export function JoinClub({ token, email }: JoinClubProps) {
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string>();
  // The member's clubs and role change: ask for the signed-in user again.
  const [accept, { loading }] = useMutation(clubsDocuments.acceptClubInvitation, { refetchQueries: ['Me'], awaitRefetchQueries: true });

  if (!token) {
    return <Alert severity="info">This link has no invitation in it. Open the link from the invitation e-mail again, or ask the club to send a new one.</Alert>;
  }
  const join = async () => {
    setProblem(undefined);
    try {
      const { data } = await accept({ variables: { token } });
      if (data) void navigate(paths.club.href(data.acceptClubInvitation), { replace: true });
    } catch (error) {
      setProblem(graphQLErrorDetails(error).map((detail) => detail.message).join(' '));
    }
  };
  return (
    <Stack spacing={2.5}>
      <Typography>
        You are signed in as <strong>{email}</strong>. Accepting adds you to the club that invited this address, as a coach or
        an athlete as the invitation says.
      </Typography>
      <FormAlert message={problem} />
      <Button variant="contained" size="large" onClick={() => void join()} loading={loading}>
        Accept the invitation
      </Button>
    </Stack>
  );
}
