import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { SafetyNote } from '../../../components/ui/safety-note.js';
import { paths } from '../../../config/paths.js';
import type { FieldNote } from '../api/types.js';
import { formatNoteDate, KIND_LABELS, STATUS_LABELS } from '../lib/note-labels.js';
import { EvidencePanel } from './evidence-panel.js';
import { FirstCutsNav } from './first-cuts-nav.js';
import { MarkReadButton } from './mark-read-button.js';
import { NoteActions } from './note-actions.js';
import { NoteBody } from './note-body.js';
import { NoteTags } from './note-tags.js';

export interface NoteViewProps {
  note: FieldNote;
  signedIn: boolean;
  onChanged: () => unknown;
}

/** One note: its text with the evidence beside it, its state for those who work on it, and reading progress. */
export function NoteView({ note, signedIn, onChanged }: NoteViewProps) {
  const isFinding = note.kind === 'FINDING';
  return (
    <Stack spacing={3}>
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
        <Chip label={KIND_LABELS[note.kind]} color={note.kind === 'SAFETY_NOTE' ? 'warning' : 'primary'} />
        {(note.isDraftView || note.status !== 'PUBLISHED') && <Chip variant="outlined" label={`${STATUS_LABELS[note.status]} · revision ${note.revisionNumber}`} />}
      </Stack>
      <PageHeading lead={note.summary}>{note.title}</PageHeading>
      <Typography variant="body2" color="text.secondary" sx={{ mt: -2 }}>
        By {note.authorName}
        {note.publishedAt ? ` · published ${formatNoteDate(note.publishedAt)}` : ` · not published yet`}
      </Typography>
      <NoteTags tags={note.tags} size="medium" />
      {note.isDraftView && note.isPublished && (
        <Alert severity="info">
          You are reading the working copy. Visitors still read the published revision:{' '}
          <Link component={RouterLink} to={paths.fieldNote.href(note.slug)}>
            open it
          </Link>
          .
        </Alert>
      )}
      {!note.isDraftView && note.hasUnpublishedChanges && note.canEdit && (
        <Alert severity="info">
          A newer revision is being worked on.{' '}
          <Link component={RouterLink} to={paths.fieldNote.href(note.slug, { draft: true })}>
            Read the working copy
          </Link>
          .
        </Alert>
      )}
      <NoteActions note={note} onChanged={onChanged} />
      <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', md: isFinding ? 'minmax(0, 2fr) minmax(260px, 1fr)' : '1fr' }, alignItems: 'start' }}>
        <NoteBody html={note.bodyHtml} />
        {(isFinding || note.evidence.length > 0) && <EvidencePanel evidence={note.evidence} isFinding={isFinding} />}
      </Box>
      {!isFinding && (
        <SafetyNote>
          Axes and saws hurt people. Wear protective boots, leg and eye protection, keep a clear zone and sheathe every edge. Endgrain
          is no substitute for coaching: follow your sanctioning body's rules, your host's rules and local law.
        </SafetyNote>
      )}
      {note.isPublished && !note.isDraftView && (
        <Stack spacing={2}>
          {signedIn ? (
            <Box>
              <MarkReadButton noteId={note.id} readAt={note.readAt} />
            </Box>
          ) : (
            <Typography variant="body2" color="text.secondary">
              <Link component={RouterLink} to={paths.auth.signIn.href(paths.fieldNote.href(note.slug))}>
                Sign in
              </Link>{' '}
              to keep track of what you have read.
            </Typography>
          )}
          <FirstCutsNav noteId={note.id} />
        </Stack>
      )}
    </Stack>
  );
}
