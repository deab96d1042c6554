import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { DIVISION_LABELS } from '@endgrain/shared';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { MeetDetail } from '../api/types.js';

const POSTABLE = ['CLOSED', 'RUNNING', 'PUBLISHED'];
/** A timekeeper posts until the results are published; corrections stay with organisers. */
const TIMEKEEPING = ['CLOSED', 'RUNNING'];

/** The way on to a meet's results: read them once published; organisers and the meet's timekeepers post them from entries closed on. */
export function ResultsLinks({ meet }: { meet: MeetDetail }) {
  const canRead = meet.status === 'PUBLISHED' || meet.status === 'ARCHIVED' || meet.canManage || meet.isTimekeeper;
  const canPost = (meet.canManage && POSTABLE.includes(meet.status)) || (meet.isTimekeeper && TIMEKEEPING.includes(meet.status));
  // Handicap starts suit timed events for one athlete on the same block size.
  const handicapEvents = meet.canManage ? meet.events.filter((e) => e.eventType.resultKind === 'TIMED' && e.eventType.teamSize === 1) : [];
  if (!canRead && !canPost && handicapEvents.length === 0) return null;
  return (
    <Stack component="nav" aria-label="Results" direction="row" sx={{ gap: 2, flexWrap: 'wrap' }}>
      {canRead && (
        <Button component={RouterLink} to={paths.meetResults.href(meet.id)} variant="outlined">
          Results and team totals
        </Button>
      )}
      {canPost && (
        <Button component={RouterLink} to={paths.postResults.href(meet.id)} variant="contained">
          Post results
        </Button>
      )}
      {handicapEvents.map((e) => (
        <Link key={e.id} component={RouterLink} to={paths.handicapMarks.href(meet.id, e.id)} sx={{ minHeight: 44, display: 'inline-flex', alignItems: 'center' }}>
          Handicap marks: {e.eventType.name}, {DIVISION_LABELS[e.division]}
        </Link>
      ))}
    </Stack>
  );
}
