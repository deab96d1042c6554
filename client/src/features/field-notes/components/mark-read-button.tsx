import CheckCircleIcon from '@mui/icons-material/CheckCircle';
import RadioButtonUncheckedIcon from '@mui/icons-material/RadioButtonUnchecked';
import { useMutation } from '@apollo/client/react';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { fieldNotesDocuments as docs } from '../api/field-notes-documents.js';

/** Reading progress for signed-in readers: one press marks the note read, another takes it back. */
export function MarkReadButton({ noteId, readAt }: { noteId: string; readAt: string | null }) {
  const [mark, { loading, error }] = useMutation(docs.markFieldNoteRead, { refetchQueries: [docs.firstCuts] });
  const read = readAt !== null;
  return (
    <Stack spacing={1} sx={{ alignItems: 'flex-start' }}>
      <Button
        variant={read ? 'outlined' : 'contained'}
        color={read ? 'success' : 'primary'}
        size="large"
        startIcon={read ? <CheckCircleIcon /> : <RadioButtonUncheckedIcon />}
        aria-pressed={read}
        loading={loading}
        onClick={() => void mark({ variables: { id: noteId, read: !read } }).catch(() => undefined)}
        sx={{ minHeight: 48 }}
      >
        {read ? 'Read — mark as unread' : 'Mark as read'}
      </Button>
      <FormAlert message={error ? `Your reading progress was not saved: ${error.message}` : undefined} />
    </Stack>
  );
}
