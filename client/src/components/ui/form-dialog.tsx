import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useId, type FormEventHandler, type ReactNode } from 'react';

export interface FormDialogProps {
  title: string;
  onClose: () => void;
  onSubmit: FormEventHandler<HTMLFormElement>;
  submitLabel: string;
  submitting: boolean;
  /** Long forms fill a phone's screen; short ones stay a card. */
  fullScreenOnPhone?: boolean;
  cancelLabel?: string;
  submitDisabled?: boolean;
  /** A short confirmation in the footer, which stays in view however far the form is scrolled. */
  footerNote?: ReactNode;
  children: ReactNode;
}

/** A dialog around one form, with Cancel and the form's submit button in its footer. */
export function FormDialog(props: FormDialogProps) {
  const { title, onClose, onSubmit, submitLabel, submitting, fullScreenOnPhone = false, cancelLabel = 'Cancel', submitDisabled = false, footerNote, children } = props;
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const titleId = useId();
  return (
    <Dialog open onClose={onClose} aria-labelledby={titleId} fullWidth maxWidth={fullScreenOnPhone ? 'sm' : 'xs'} fullScreen={fullScreenOnPhone && phone}>
      <DialogTitle id={titleId}>{title}</DialogTitle>
      <DialogContent>
        <Stack component="form" id={`${titleId}-form`} noValidate onSubmit={onSubmit} spacing={2.5} sx={{ pt: 1 }}>
          {children}
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, gap: 1, flexWrap: 'wrap' }}>
        {footerNote && (
          <Typography role="status" variant="body2" sx={{ flex: '1 1 100%', color: 'success.main', fontWeight: 700 }}>
            {footerNote}
          </Typography>
        )}
        <Button onClick={onClose} disabled={submitting}>
          {cancelLabel}
        </Button>
        <Button type="submit" form={`${titleId}-form`} variant="contained" loading={submitting} disabled={submitDisabled}>
          {submitLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
