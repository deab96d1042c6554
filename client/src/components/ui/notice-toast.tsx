import Snackbar from '@mui/material/Snackbar';

export interface NoticeToastProps {
  /** Nothing is shown while this is empty. */
  message: string | undefined;
  onClose: () => void;
}

/** A short confirmation after a change, which goes away by itself. */
export function NoticeToast({ message, onClose }: NoticeToastProps) {
  return (
    <Snackbar
      open={Boolean(message)}
      autoHideDuration={6000}
      onClose={onClose}
      message={message}
      // Above the phone's bottom bar, not over it.
      sx={{ bottom: { xs: 'calc(80px + env(safe-area-inset-bottom))', sm: 24 } }}
    />
  );
}
