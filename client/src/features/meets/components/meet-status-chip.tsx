import { MEET_STATUS_LABELS, type MeetStatus } from '@endgrain/shared';
import Chip, { type ChipProps } from '@mui/material/Chip';

// Orange stays reserved for safety, so no status uses the warning colour.
const COLOURS: Record<MeetStatus, ChipProps['color']> = {
  DRAFT: 'default',
  OPEN: 'success',
  CLOSED: 'secondary',
  RUNNING: 'primary',
  PUBLISHED: 'info',
  ARCHIVED: 'default',
};

export function MeetStatusChip({ status, size = 'small' }: { status: MeetStatus; size?: ChipProps['size'] }) {
  return (
    <Chip
      label={MEET_STATUS_LABELS[status]}
      color={COLOURS[status]}
      variant={status === 'DRAFT' || status === 'ARCHIVED' ? 'outlined' : 'filled'}
      size={size}
    />
  );
}
