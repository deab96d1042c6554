import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';

import type { RackUrlFilter } from '../lib/use-rack-filter.js';
import { AXE_STATUSES, AXE_USES, GRIND_LABELS, GRINDS, STATUS_LABELS, USE_LABELS } from '../lib/rack-labels.js';

export interface RackFiltersProps {
  filter: RackUrlFilter;
  onChange: (change: Partial<RackUrlFilter>) => void;
  narrowed: boolean;
}

type Key = 'grind' | 'status' | 'use';
const FILTERS: { key: Key; label: string; any: string; values: readonly string[]; labels: Record<string, string> }[] = [
  { key: 'grind', label: 'Grind', any: 'Any grind', values: GRINDS, labels: GRIND_LABELS },
  { key: 'status', label: 'Status', any: 'Any status', values: AXE_STATUSES, labels: STATUS_LABELS },
  { key: 'use', label: 'Who may use it', any: 'Any rule', values: AXE_USES, labels: USE_LABELS },
];

// The empty choice ("Any grind") is shown, so the label sits above it.
const slots = { select: { displayEmpty: true }, inputLabel: { shrink: true } } as const;

export function RackFilters({ filter, onChange, narrowed }: RackFiltersProps) {
  return (
    <Box sx={{ display: 'grid', gap: 1, gridTemplateColumns: { xs: 'repeat(3, minmax(0, 1fr))', md: 'repeat(3, minmax(0, 220px)) auto' }, alignItems: 'center' }}>
      {FILTERS.map(({ key, label, any, values, labels }) => (
        <TextField key={key} select label={label} value={filter[key]} onChange={(event) => onChange({ [key]: event.target.value } as Partial<RackUrlFilter>)} slotProps={slots}>
          <MenuItem value="">{any}</MenuItem>
          {values.map((value) => (
            <MenuItem key={value} value={value}>
              {labels[value]}
            </MenuItem>
          ))}
        </TextField>
      ))}
      {narrowed && (
        <Button onClick={() => onChange({ grind: '', status: '', use: '' })} sx={{ justifySelf: 'start', gridColumn: { xs: '1 / -1', md: 'auto' } }}>
          Clear filters
        </Button>
      )}
    </Box>
  );
}
