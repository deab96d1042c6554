import { useQuery } from '@apollo/client/react';
import { DIVISION_LABELS, EXPERIENCE_LABELS } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { clubsDocuments } from '../api/clubs-documents.js';

export function AthleteProfile({ athleteId }: { athleteId: string }) {
  const { data, loading, error } = useQuery(clubsDocuments.athlete, { variables: { id: athleteId } });
  if (loading && !data) return <PageLoading label="Loading the athlete" />;
  if (error || !data) {
    const notFound = graphQLErrorDetails(error).some((detail) => detail.code === 'NOT_FOUND');
    return (
      <Alert severity={notFound ? 'info' : 'error'} role="alert">
        {notFound ? 'There is no such athlete; they may have been taken off a roster.' : graphQLErrorDetails(error)[0]?.message}
      </Alert>
    );
  }
  const athlete = data.athlete;
  const facts: [string, ReactNode][] = [
    ['Club', <Link key="club" component={RouterLink} to={paths.club.href(athlete.clubId)}>{athlete.clubName}</Link>],
    ['Divisions', athlete.divisions.map((division) => DIVISION_LABELS[division]).join(', ')],
    ['Experience', EXPERIENCE_LABELS[athlete.experience]],
    ['First season', athlete.firstSeasonYear ?? 'Not recorded'],
  ];
  return (
    <Stack spacing={3} sx={{ maxWidth: 840 }}>
      <PageHeading>{athlete.name}</PageHeading>
      <Box component="dl" sx={{ m: 0, display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr 1fr', sm: 'repeat(4, minmax(0, 1fr))' } }}>
        {facts.map(([label, value]) => (
          <div key={label}>
            <Typography component="dt" variant="body2" sx={{ color: 'text.secondary' }}>
              {label}
            </Typography>
            <Typography component="dd" sx={{ m: 0, fontWeight: 600 }}>
              {value}
            </Typography>
          </div>
        ))}
      </Box>
    </Stack>
  );
}
