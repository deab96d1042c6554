import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';

import type { NoteHistory as History, ReviewAction } from '../api/types.js';
import { formatNoteDate } from '../lib/note-labels.js';
import { RevisionDiff } from './revision-diff.js';

const ACTIONS: Record<ReviewAction, string> = { SUBMITTED: 'Sent for review', SENT_BACK: 'Sent back', PUBLISHED: 'Published', UNPUBLISHED: 'Withdrawn' };

/** Every revision, any two compared line by line, and the review trail with its comments. */
export function NoteHistory({ history }: { history: History }) {
  const { revisions, reviews } = history;
  const newest = revisions[0];
  const [newer, setNewer] = useState(newest?.number ?? 1);
  const [older, setOlder] = useState((revisions.find((r) => r.isPublished && r.number !== newest?.number) ?? revisions[1] ?? newest)?.number ?? 1);
  const pick = (n: number) => revisions.find((r) => r.number === n);
  const a = pick(older);
  const b = pick(newer);
  const label = (n: number) => {
    const r = pick(n);
    return r ? `Revision ${r.number}${r.isPublished ? ' (published)' : ''} · ${r.writtenByName} · ${formatNoteDate(r.createdAt)}` : '';
  };

  return (
    <Stack spacing={4}>
      <Stack spacing={2} component="section" aria-labelledby="compare-heading">
        <Typography id="compare-heading" variant="h2" sx={{ fontSize: '1.3rem' }}>
          Compare revisions
        </Typography>
        {revisions.length < 2 ? (
          <Typography color="text.secondary">There is only one revision so far. Each save makes a new one, which you can compare here.</Typography>
        ) : (
          <>
            <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
              {([['Older', older, setOlder], ['Newer', newer, setNewer]] as const).map(([text, value, set]) => (
                <TextField key={text} select label={text} value={value} onChange={(e) => set(Number(e.target.value))} sx={{ minWidth: 320 }}>
                  {revisions.map((r) => (
                    <MenuItem key={r.id} value={r.number}>
                      {label(r.number)}
                    </MenuItem>
                  ))}
                </TextField>
              ))}
            </Stack>
            {a && b && <RevisionDiff older={a} newer={b} />}
          </>
        )}
      </Stack>
      <Stack spacing={1} component="section" aria-labelledby="revisions-heading">
        <Typography id="revisions-heading" variant="h2" sx={{ fontSize: '1.3rem' }}>
          Revisions
        </Typography>
        <Paper variant="outlined">
          <List dense>
            {revisions.map((r) => (
              <ListItem key={r.id}>
                <ListItemText primary={label(r.number)} secondary={r.note || 'No change note.'} />
              </ListItem>
            ))}
          </List>
        </Paper>
      </Stack>
      <Stack spacing={1} component="section" aria-labelledby="reviews-heading">
        <Typography id="reviews-heading" variant="h2" sx={{ fontSize: '1.3rem' }}>
          Review trail
        </Typography>
        {reviews.length === 0 ? (
          <Typography color="text.secondary">Nothing has been sent for review yet.</Typography>
        ) : (
          <Paper variant="outlined">
            <List dense>
              {reviews.map((r) => (
                <ListItem key={r.id}>
                  <ListItemText primary={`${ACTIONS[r.action]} by ${r.actorName} · revision ${r.revisionNumber} · ${formatNoteDate(r.createdAt)}`} secondary={r.comment || undefined} />
                </ListItem>
              ))}
            </List>
          </Paper>
        )}
      </Stack>
    </Stack>
  );
}
