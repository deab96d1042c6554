import Chip from '@mui/material/Chip';

import type { AxeStatus } from '../api/types.js';
import { STATUS_LABELS } from '../lib/rack-labels.js';

// Signal orange is kept for safety wording, so "needs an edge" wears heartwood brown.
const COLOUR: Record<AxeStatus, 'success' | 'secondary' | 'error' | 'default'> = {
  READY: 'success',
  NEEDS_EDGE: 'secondary',
  NEEDS_HANDLE: 'error',
  HEAD_LOOSE: 'error',
  RETIRED: 'default',
};

/** The axe's status in words and colour (the words carry the meaning; colour only helps). */
export function AxeStatusChip({ status }: { status: AxeStatus }) {
  return <Chip size="small" label={STATUS_LABELS[status]} color={COLOUR[status]} variant={status === 'READY' ? 'outlined' : 'filled'} />;
}
