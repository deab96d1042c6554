import CloudDone from '@mui/icons-material/CloudDone';
import CloudOff from '@mui/icons-material/CloudOff';
import CloudUpload from '@mui/icons-material/CloudUpload';
import PhoneAndroid from '@mui/icons-material/PhoneAndroid';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../../config/paths.js';
import type { TrialDraft } from '../../lib/trial-draft.js';

export interface SyncStatusProps {
  draft: TrialDraft;
  online: boolean;
  /** The draft has everything the server needs (block, a tester, a reference axe). */
  complete: boolean;
  onSendNow: () => void;
  onUseSaved: () => void;
  onKeepMine: () => void;
}

const time = (iso: string | null) => (iso ? new Date(iso).toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit' }) : '');

/** Where the phone's copy is: kept here, on its way, or on the server; said in words, not only colour. */
export function SyncStatus({ draft, online, complete, onSendNow, onUseSaved, onKeepMine }: SyncStatusProps) {
  let severity: 'info' | 'success' | 'warning' | 'error' = 'info';
  let icon: ReactNode = <PhoneAndroid />;
  let text: ReactNode;
  let action: ReactNode = null;
  if (draft.sync === 'sending') {
    icon = <CloudUpload />;
    text = 'Saved on this phone · sending…';
  } else if (draft.sync === 'sent') {
    severity = 'success';
    icon = <CloudDone />;
    text = `Sent · on the server since ${time(draft.sentAt)}`;
    action = (
      <Button component={RouterLink} to={paths.trial.href(draft.id)} color="inherit">
        See the ranking
      </Button>
    );
  } else if (draft.sync === 'conflict') {
    severity = 'warning';
    text = draft.problem;
    action = (
      <Stack direction="row" spacing={1}>
        <Button color="inherit" onClick={onUseSaved}>
          Use the saved copy
        </Button>
        <Button color="inherit" onClick={onKeepMine}>
          Keep mine
        </Button>
      </Stack>
    );
  } else if (draft.sync === 'refused') {
    severity = 'error';
    text = `Saved on this phone, but the server refused it: ${draft.problem ?? ''}`;
  } else if (!online) {
    severity = 'warning';
    icon = <CloudOff />;
    text = 'Saved on this phone · no connection: it is sent when you are back online';
  } else if (!complete) {
    text = 'Saved on this phone · fill in the block, a tester and the reference axe to send it';
  } else {
    text = 'Saved on this phone · sending shortly';
    action = (
      <Button color="inherit" onClick={onSendNow}>
        Send now
      </Button>
    );
  }
  return (
    <Alert role="status" aria-live="polite" severity={severity} icon={icon} action={action} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
      {text}
    </Alert>
  );
}
