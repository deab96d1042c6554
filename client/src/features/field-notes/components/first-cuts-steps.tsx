import CheckIcon from '@mui/icons-material/Check';
import LinearProgress from '@mui/material/LinearProgress';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { FirstCuts } from '../api/types.js';
import { KIND_LABELS } from '../lib/note-labels.js';

/** The series in order, big enough to tap on a phone, with the reader's progress when signed in. */
export function FirstCutsSteps({ series, signedIn }: { series: FirstCuts; signedIn: boolean }) {
  const total = series.steps.length;
  const next = series.steps.find((s) => s.note.readAt === null);
  return (
    <Stack spacing={2}>
      {signedIn && total > 0 && (
        <Stack spacing={0.5}>
          <Typography id="first-cuts-progress">
            {series.readCount === total ? `All ${total} read. Well done — keep practising with your coach.` : `${series.readCount} of ${total} read${next ? ` · next: ${next.note.title}` : ''}`}
          </Typography>
          <LinearProgress variant="determinate" value={total ? Math.round((100 * series.readCount) / total) : 0} aria-labelledby="first-cuts-progress" sx={{ height: 8, borderRadius: 4 }} />
        </Stack>
      )}
      <Paper variant="outlined">
        <List component="ol" aria-label="First Cuts steps" sx={{ py: 0 }}>
          {series.steps.map((step) => (
            <li key={step.note.id}>
              <ListItemButton component={RouterLink} to={paths.fieldNote.href(step.note.slug)} divider sx={{ minHeight: 72, alignItems: 'flex-start', py: 1.5 }}>
                <ListItemIcon sx={{ minWidth: 48, mt: 0.5 }}>
                  <Typography
                    component="span"
                    aria-hidden
                    sx={{ width: 30, height: 30, borderRadius: '50%', border: 2, borderColor: step.note.readAt ? 'success.main' : 'primary.main', bgcolor: step.note.readAt ? 'success.main' : 'transparent', color: step.note.readAt ? 'success.contrastText' : 'text.primary', display: 'grid', placeItems: 'center', fontWeight: 700 }}
                  >
                    {step.note.readAt ? <CheckIcon fontSize="small" /> : step.position}
                  </Typography>
                </ListItemIcon>
                <ListItemText
                  primary={step.note.title}
                  secondary={`${step.note.readAt ? 'Read · ' : ''}${KIND_LABELS[step.note.kind]} · ${step.note.summary}`}
                  slotProps={{ primary: { sx: { fontWeight: 700 } } }}
                />
              </ListItemButton>
            </li>
          ))}
        </List>
      </Paper>
    </Stack>
  );
}
