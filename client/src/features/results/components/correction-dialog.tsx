import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import TextField from '@mui/material/TextField';
import { useState } from 'react';

export interface CorrectionDialogProps {
  who: string | null;
  onCancel(): void;
  onConfirm(reason: string): void;
}

/** A published result changes only with a reason, which the audit log keeps with who and when. */
export function CorrectionDialog({ who, onCancel, onConfirm }: CorrectionDialogProps) {
  const [reason, setReason] = useState('');
  const short = reason.trim().length < 3;
  return (
    <Dialog open={who !== null} onClose={onCancel} aria-labelledby="correction-title" fullWidth maxWidth="sm">
      <DialogTitle id="correction-title">Correct the published result of {who}</DialogTitle>
      <DialogContent>
        <DialogContentText sx={{ mb: 2 }}>
          Places, points and standings follow the change. Say why it changes: the reason is kept on record with your name.
        </DialogContentText>
        <TextField autoFocus fullWidth label="Reason for the correction" value={reason} onChange={(e) => setReason(e.target.value)} slotProps={{ htmlInput: { maxLength: 300 } }} />
      </DialogContent>
      <DialogActions>
        <Button onClick={onCancel}>Keep it as it was</Button>
        <Button variant="contained" disabled={short} onClick={() => onConfirm(reason.trim())}>
          Save the correction
        </Button>
      </DialogActions>
    </Dialog>
  );
}
