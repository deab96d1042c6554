import { DIVISION_LABELS } from '@endgrain/shared';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import type { MeetDetail } from '../api/types.js';
import { formatDeadline } from '../lib/format-deadline.js';
import { formatMeetDate } from '../lib/format-meet-date.js';
import { MeetStatusChip } from './meet-status-chip.js';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <Box>
      <Typography component="dt" variant="body2" sx={{ color: 'text.secondary' }}>
        {label}
      </Typography>
      <Typography component="dd" sx={{ m: 0, fontWeight: 600 }}>
        {children}
      </Typography>
    </Box>
  );
}

function entriesLine(meet: MeetDetail): string {
  const deadline = formatDeadline(meet.entryDeadline);
  if (meet.entriesOpen) return `Open until ${deadline}`;
  if (meet.status === 'OPEN') return `Deadline passed (${deadline})`;
  if (meet.status === 'DRAFT') return `Will close ${deadline}`;
  return `Closed (deadline ${deadline})`;
}

export function MeetHeader({ meet }: { meet: MeetDetail }) {
  return (
    <Stack spacing={2}>
      <Box>
        <MeetStatusChip status={meet.status} size="medium" />
        <Box sx={{ mt: 1.5 }}>
          <PageHeading>{meet.name}</PageHeading>
        </Box>
      </Box>
      <Box
        component="dl"
        sx={{ m: 0, display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr 1fr', md: 'repeat(3, minmax(0, 1fr))' } }}
      >
        <Fact label="Date">{formatMeetDate(meet.startsOn)}</Fact>
        <Fact label="Venue">{meet.venue}</Fact>
        <Fact label="Host">
          <Link component={RouterLink} to={paths.club.href(meet.hostClubId)}>
            {meet.hostClubName}
          </Link>
        </Fact>
        <Fact label="Season">{meet.seasonName}</Fact>
        <Fact label="Divisions">{meet.divisions.map((division) => DIVISION_LABELS[division]).join(', ')}</Fact>
        <Fact label="Entries">{entriesLine(meet)}</Fact>
      </Box>
    </Stack>
  );
}
