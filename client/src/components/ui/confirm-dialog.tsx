import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useId, useState, type ReactNode } from 'react';

import { FormAlert } from './form-alert.js';
import { graphQLErrorDetails } from '../../lib/graphql-error-details.js';

export interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  /** Shown in the error colour: withdrawing, removing, deleting. */
  destructive?: boolean;
  /** Runs the change; a rejection's server message stays in the dialog. */
  onConfirm: () => Promise<unknown>;
  onClose: () => void;
}

/** Asks before a change that is hard to take back, and keeps the server's refusal in view. */
export function ConfirmDialog({ open, title, children, confirmLabel, destructive = false, onConfirm, onClose }: ConfirmDialogProps) {
  const [pending, setPending] = useState(false);
  const [problem, setProblem] = useState<string>();
  const titleId = useId();

  const close = () => {
    if (pending) return;
    setProblem(undefined);
    onClose();
  };
  const confirm = async () => {
    setPending(true);
    setProblem(undefined);
    try {
      await onConfirm();
      onClose();
    } catch (error) {
      setProblem(graphQLErrorDetails(error).map((detail) => detail.message).join(' '));
    } finally {
      setPending(false);
    }
  };

  return (
    <Dialog open={open} onClose={close} aria-labelledby={titleId} fullWidth maxWidth="xs">
      <DialogTitle id={titleId}>{title}</DialogTitle>
      <DialogContent>
        <Stack spacing={2}>
          <div>{children}</div>
          <FormAlert message={problem} />
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, gap: 1, flexWrap: 'wrap' }}>
        <Button onClick={close} disabled={pending}>
          Cancel
        </Button>
        <Button
          variant="contained"
          color={destructive ? 'error' : 'primary'}
          onClick={() => void confirm()}
          loading={pending}
        >
          {confirmLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
