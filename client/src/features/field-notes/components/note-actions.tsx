import { useMutation } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { SEND_BACK_COMMENT_MIN } from '@endgrain/shared';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';

import { ConfirmDialog } from '../../../components/ui/confirm-dialog.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { fieldNotesDocuments as docs } from '../api/field-notes-documents.js';
import type { FieldNote } from '../api/types.js';
import { WORKING_COPY } from '../lib/note-labels.js';
import { CommentDialog } from './comment-dialog.js';

type Step = 'submit' | 'publish' | 'sendBack' | 'unpublish' | 'delete';

/** The workflow buttons a reader may use on this note; the server decides again on every press. */
export function NoteActions({ note, onChanged }: { note: FieldNote; onChanged: () => unknown }) {
  const navigate = useNavigate();
  const [open, setOpen] = useState<Step | null>(null);
  const [problem, setProblem] = useState<string>();
  const [submit, submitState] = useMutation(docs.submitFieldNote, WORKING_COPY);
  const [publish] = useMutation(docs.publishFieldNote, WORKING_COPY);
  const [sendBack] = useMutation(docs.sendBackFieldNote, WORKING_COPY);
  const [unpublish] = useMutation(docs.unpublishFieldNote, WORKING_COPY);
  const [remove] = useMutation(docs.deleteFieldNoteDraft);
  const variables = { id: note.id };
  const reviewing = note.canReview && note.status === 'IN_REVIEW';
  const after = async () => {
    setOpen(null);
    await onChanged();
  };

  const sendForReview = async () => {
    setProblem(undefined);
    try {
      await submit({ variables });
      await onChanged();
    } catch (error) {
      setProblem(graphQLErrorDetails(error).map((d) => d.message).join(' '));
    }
  };

  const buttons = [
    note.canEdit && (
      <Button key="edit" variant="outlined" component={RouterLink} to={paths.editFieldNote.href(note.slug)}>
        Edit
      </Button>
    ),
    (note.canEdit || note.canReview) && (
      <Button key="history" component={RouterLink} to={paths.fieldNoteHistory.href(note.slug)}>
        Revisions and review
      </Button>
    ),
    note.canSubmit && (
      <Button key="submit" variant="contained" onClick={() => void sendForReview()} loading={submitState.loading}>
        Send for review
      </Button>
    ),
    reviewing && note.canPublish && (
      <Button key="publish" variant="contained" onClick={() => setOpen('publish')}>
        Publish
      </Button>
    ),
    reviewing && (
      <Button key="back" variant="outlined" onClick={() => setOpen('sendBack')}>
        Send back
      </Button>
    ),
    note.canReview && note.isPublished && (
      <Button key="withdraw" color="error" onClick={() => setOpen('unpublish')}>
        Withdraw
      </Button>
    ),
    note.canEdit && !note.isPublished && note.status === 'DRAFT' && (
      <Button key="delete" color="error" onClick={() => setOpen('delete')}>
        Delete draft
      </Button>
    ),
  ].filter(Boolean);
  if (buttons.length === 0) return null;

  return (
    <Stack spacing={1.5}>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }} role="group" aria-label="Note actions">
        {buttons}
      </Stack>
      {reviewing && !note.canPublish && note.publishRefusal && <Alert severity="info">{note.publishRefusal}</Alert>}
      {problem && (
        <Alert severity="error" role="alert">
          {problem}
        </Alert>
      )}
      <CommentDialog open={open === 'publish'} title="Publish this note?" commentLabel="Note for the author" confirmLabel="Publish" onClose={() => setOpen(null)}
        onConfirm={async (comment) => { await publish({ variables: { ...variables, comment } }); await after(); }}>
        Visitors will read revision {note.revisionNumber}, and it joins search.
      </CommentDialog>
      <CommentDialog open={open === 'sendBack'} title="Send back to the author" commentLabel="What needs changing" minLength={SEND_BACK_COMMENT_MIN} confirmLabel="Send back" onClose={() => setOpen(null)}
        onConfirm={async (comment) => { await sendBack({ variables: { ...variables, comment } }); await after(); }} />
      <CommentDialog open={open === 'unpublish'} title="Withdraw this note?" commentLabel="Why it is withdrawn" minLength={SEND_BACK_COMMENT_MIN} confirmLabel="Withdraw" destructive onClose={() => setOpen(null)}
        onConfirm={async (comment) => { await unpublish({ variables: { ...variables, comment } }); await after(); }}>
        It leaves the public pages and search at once. Its revisions are kept, and it can be published again after review.
      </CommentDialog>
      <ConfirmDialog open={open === 'delete'} title="Delete this draft?" confirmLabel="Delete" destructive onClose={() => setOpen(null)}
        onConfirm={async () => { await remove({ variables }); setOpen(null); await navigate(paths.myFieldNotes.href()); }}>
        The draft and all its revisions are deleted. This cannot be undone.
      </ConfirmDialog>
    </Stack>
  );
}
