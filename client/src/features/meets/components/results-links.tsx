import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { MeetDetail } from '../api/types.js';

const POSTABLE = ['CLOSED', 'RUNNING', 'PUBLISHED'];

/** The way on to a meet's results: read them once published; organisers post them from entries closed on. */
export function ResultsLinks({ meet }: { meet: MeetDetail }) {
  const canRead = meet.status === 'PUBLISHED' || meet.status === 'ARCHIVED' || meet.canManage;
  const canPost = meet.canManage && POSTABLE.includes(meet.status);
  if (!canRead && !canPost) return null;
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
    </Stack>
  );
}
