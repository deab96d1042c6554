import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { MeetDetail } from '../api/types.js';

/** Clubs the reader coaches that have entries in the meet, named as the entries name them. */
function coachedClubsWithEntries(meet: MeetDetail): { id: string; name: string }[] {
  const found = new Map<string, string>();
  for (const event of meet.events) {
    for (const entry of event.entries) {
      if (meet.enterableClubIds.includes(entry.clubId)) found.set(entry.clubId, entry.clubName);
    }
  }
  return [...found].map(([id, name]) => ({ id, name }));
}

/** Sends a coach on to pick the axes for their entries; one link per club when they coach several. */
export function LineupLinks({ meet }: { meet: MeetDetail }) {
  const clubs = coachedClubsWithEntries(meet);
  if (clubs.length === 0) return null;
  return (
    <Stack component="nav" aria-label="Lineups" direction="row" sx={{ gap: 2, flexWrap: 'wrap' }}>
      {clubs.map((club) => (
        <Link key={club.id} component={RouterLink} to={paths.rackLineup.href(meet.id, club.id)} sx={{ minHeight: 44, display: 'inline-flex', alignItems: 'center' }}>
          {clubs.length === 1 ? 'Lineup and axes' : `Lineup and axes: ${club.name}`}
        </Link>
      ))}
    </Stack>
  );
}
