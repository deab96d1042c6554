import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useId, useState, type ReactNode } from 'react';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';

export interface CommentDialogProps {
  open: boolean;
  title: string;
  children?: ReactNode;
  /** The comment box's label; leave out for a plain confirmation. */
  commentLabel?: string;
  /** Characters the comment needs; 0 makes it optional. */
  minLength?: number;
  confirmLabel: string;
  destructive?: boolean;
  onConfirm: (comment: string) => Promise<unknown>;
  onClose: () => void;
}

/** Asks before a workflow step, with a comment when the step needs one; the server's refusal stays in view. */
export function CommentDialog({ open, title, children, commentLabel, minLength = 0, confirmLabel, destructive = false, onConfirm, onClose }: CommentDialogProps) {
  const [comment, setComment] = useState('');
  const [pending, setPending] = useState(false);
  const [problem, setProblem] = useState<string>();
  const titleId = useId();
  const short = commentLabel !== undefined && comment.trim().length < minLength;

  const close = () => {
    if (pending) return;
    setProblem(undefined);
    setComment('');
    onClose();
  };
  const confirm = async () => {
    setPending(true);
    setProblem(undefined);
    try {
      await onConfirm(comment.trim());
      setComment('');
      onClose();
    } catch (error) {
      setProblem(graphQLErrorDetails(error).map((d) => d.message).join(' '));
    } finally {
      setPending(false);
    }
  };

  return (
    <Dialog open={open} onClose={close} aria-labelledby={titleId} fullWidth maxWidth="sm">
      <DialogTitle id={titleId}>{title}</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 0.5 }}>
          {children && <Typography component="div">{children}</Typography>}
          {commentLabel && (
            <TextField
              label={commentLabel}
              value={comment}
              onChange={(event) => setComment(event.target.value)}
              multiline
              minRows={3}
              fullWidth
              helperText={minLength > 0 ? `At least ${minLength} characters.` : 'Optional.'}
            />
          )}
          <FormAlert message={problem} />
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, gap: 1, flexWrap: 'wrap' }}>
        <Button onClick={close} disabled={pending}>
          Cancel
        </Button>
        <Button variant="contained" color={destructive ? 'error' : 'primary'} onClick={() => void confirm()} loading={pending} disabled={short}>
          {confirmLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
