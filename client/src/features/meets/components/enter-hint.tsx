import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { ClubOption, MeetDetail } from '../api/types.js';
import { formatDeadline } from '../lib/format-deadline.js';

/** Tells a coach whether and until when they can enter, and where the roster lives. */
export function EnterHint({ meet, clubs }: { meet: MeetDetail; clubs: ClubOption[] }) {
  const own = clubs.length === 1 ? clubs[0] : undefined;
  const who = own ? own.name : 'your clubs';
  if (!meet.entriesOpen) {
    return (
      <Alert severity="info">
        {meet.status === 'OPEN'
          ? `The entry deadline has passed. Ask the organiser if ${who} still needs a change.`
          : `This meet is not taking entries right now, so ${who} cannot enter or withdraw athletes.`}
      </Alert>
    );
  }
  return (
    <Alert severity="info">
      You can enter athletes for {who} until {formatDeadline(meet.entryDeadline)}: use Enter athletes under each event.
      {own && (
        <>
          {' '}
          Missing someone?{' '}
          <Link component={RouterLink} to={paths.club.href(own.id)}>
            Add them to the roster
          </Link>
          .
        </>
      )}
    </Alert>
  );
}
