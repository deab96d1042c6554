import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import type { FieldNote } from '../api/types.js';
import { formatNoteDate, KIND_LABELS, STATUS_LABELS } from '../lib/note-labels.js';
import { NoteTags } from './note-tags.js';

export interface NoteCardProps {
  note: FieldNote;
  href: string;
  /** Show the workflow state (for the author's and reviewer's lists). */
  showStatus?: boolean;
}

export function NoteCard({ note, href, showStatus = false }: NoteCardProps) {
  return (
    <Card variant="outlined" component="article">
      <CardActionArea component={RouterLink} to={href} sx={{ height: '100%' }}>
        <CardContent>
          <Stack spacing={1}>
            <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
              <Chip size="small" label={KIND_LABELS[note.kind]} color={note.kind === 'SAFETY_NOTE' ? 'warning' : 'default'} />
              {showStatus && <Chip size="small" variant="outlined" label={STATUS_LABELS[note.status]} />}
              {note.readAt && <Chip size="small" variant="outlined" color="success" label="Read" />}
            </Stack>
            <Typography variant="h2" sx={{ fontSize: '1.15rem', fontWeight: 700 }}>
              {note.title}
            </Typography>
            <Typography variant="body2" color="text.secondary">
              {note.summary}
            </Typography>
            <NoteTags tags={note.tags} />
            <Typography variant="caption" color="text.secondary">
              {note.authorName}
              {note.publishedAt ? ` · ${formatNoteDate(note.publishedAt)}` : ` · updated ${formatNoteDate(note.updatedAt)}`}
            </Typography>
          </Stack>
        </CardContent>
      </CardActionArea>
    </Card>
  );
}
