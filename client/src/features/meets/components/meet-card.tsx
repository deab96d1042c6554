import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { MeetSummary } from '../api/types.js';
import { formatDeadline } from '../lib/format-deadline.js';
import { formatMeetDate } from '../lib/format-meet-date.js';
import { MeetStatusChip } from './meet-status-chip.js';

/** One meet on a phone: the whole card is the link, so it is easy to hit with a thumb. */
export function MeetCard({ meet }: { meet: MeetSummary }) {
  return (
    <Card variant="outlined" component="li" sx={{ listStyle: 'none' }}>
      <CardActionArea component={RouterLink} to={paths.meet.href(meet.id)}>
        <CardContent>
          <Stack spacing={0.75}>
            <Stack direction="row" spacing={1} sx={{ justifyContent: 'space-between', alignItems: 'flex-start' }}>
              <Typography component="h2" variant="h3" sx={{ fontSize: '1.125rem' }}>
                {meet.name}
              </Typography>
              <MeetStatusChip status={meet.status} />
            </Stack>
            <Typography variant="body2">
              {formatMeetDate(meet.startsOn)} · {meet.venue}
            </Typography>
            <Typography variant="body2" sx={{ color: 'text.secondary' }}>
              Hosted by {meet.hostClubName} · {meet.eventCount} {meet.eventCount === 1 ? 'event' : 'events'} · {meet.entryCount}{' '}
              {meet.entryCount === 1 ? 'entry' : 'entries'}
            </Typography>
            <Typography variant="body2" sx={{ color: meet.entriesOpen ? 'success.main' : 'text.secondary', fontWeight: meet.entriesOpen ? 700 : 400 }}>
              {meet.entriesOpen ? 'Entries close' : 'Entry deadline'} {formatDeadline(meet.entryDeadline)}
            </Typography>
          </Stack>
        </CardContent>
      </CardActionArea>
    </Card>
  );
}
