import { useQuery } from '@apollo/client/react';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

import { meetsDocuments } from '../api/meets-documents.js';
import type { MeetScoring } from '../api/types.js';
import { describeMeetChange } from '../lib/describe-meet-change.js';
import { formatMoment } from '../../../lib/format-moment.js';

/** For organisers, once a meet has results: each change to its scoring, who made it, when and why. */
export function MeetChanges({ meetId, meet }: { meetId: string; meet: MeetScoring }) {
  const { data } = useQuery(meetsDocuments.meetChanges, { variables: { meetId }, fetchPolicy: 'cache-and-network' });
  const changes = data?.meetChanges ?? [];
  if (changes.length === 0) return null;
  return (
    <Paper component="section" variant="outlined" aria-labelledby="meet-changes" sx={{ p: { xs: 2, sm: 3 } }}>
      <Typography id="meet-changes" variant="h3" component="h2" sx={{ mb: 1 }}>
        Scoring changes
      </Typography>
      <Stack spacing={2} component="ol" sx={{ m: 0, pl: 0, listStyle: 'none' }}>
        {changes.map((c) => {
          const { was, now } = describeMeetChange(c.before, c.after, meet);
          return (
            <li key={c.id}>
              <Typography sx={{ fontWeight: 700 }}>{c.summary}</Typography>
              <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                {formatMoment(c.at)} · {c.byName ?? 'an account no longer on record'}
              </Typography>
              {was.map((line) => <Typography key={`was-${line}`} variant="body2">Was: {line}</Typography>)}
              {now.map((line) => <Typography key={`now-${line}`} variant="body2">Now: {line}</Typography>)}
            </li>
          );
        })}
      </Stack>
      <Typography variant="caption" sx={{ color: 'text.secondary' }}>Places, points and standings were worked out again after each change.</Typography>
    </Paper>
  );
}
