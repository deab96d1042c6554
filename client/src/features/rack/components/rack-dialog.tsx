import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useId, type FormEventHandler, type ReactNode } from 'react';

export interface RackDialogProps {
  title: string;
  onClose: () => void;
  onSubmit: FormEventHandler<HTMLFormElement>;
  submitLabel: string;
  submitting: boolean;
  children: ReactNode;
}

/** One form in a dialog that fills a phone's screen, with Cancel and submit in the footer. */
export function RackDialog({ title, onClose, onSubmit, submitLabel, submitting, children }: RackDialogProps) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const titleId = useId();
  return (
    <Dialog open onClose={onClose} aria-labelledby={titleId} fullWidth maxWidth="sm" fullScreen={phone}>
      <DialogTitle id={titleId}>{title}</DialogTitle>
      <DialogContent>
        <Stack component="form" id={`${titleId}-form`} noValidate onSubmit={onSubmit} spacing={2.5} sx={{ pt: 1 }}>
          {children}
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, gap: 1 }}>
        <Button onClick={onClose} disabled={submitting}>
          Cancel
        </Button>
        <Button type="submit" form={`${titleId}-form`} variant="contained" loading={submitting}>
          {submitLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
