import CheckCircleIcon from '@mui/icons-material/CheckCircle';
import RadioButtonUncheckedIcon from '@mui/icons-material/RadioButtonUnchecked';
import { useMutation } from '@apollo/client/react';
import Button from '@mui/material/Button';

import { fieldNotesDocuments as docs } from '../api/field-notes-documents.js';

/** Reading progress for signed-in readers: one press marks the note read, another takes it back. */
export function MarkReadButton({ noteId, readAt }: { noteId: string; readAt: string | null }) {
  const [mark, { loading }] = useMutation(docs.markFieldNoteRead, { refetchQueries: [docs.firstCuts] });
  const read = readAt !== null;
  return (
    <Button
      variant={read ? 'outlined' : 'contained'}
      color={read ? 'success' : 'primary'}
      size="large"
      startIcon={read ? <CheckCircleIcon /> : <RadioButtonUncheckedIcon />}
      aria-pressed={read}
      loading={loading}
      onClick={() => void mark({ variables: { id: noteId, read: !read } })}
      sx={{ minHeight: 48 }}
    >
      {read ? 'Read — mark as unread' : 'Mark as read'}
    </Button>
  );
}
