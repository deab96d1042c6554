import { MEET_STATUS_LABELS, MEET_STATUSES } from '@endgrain/shared';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import TextField from '@mui/material/TextField';

import type { ClubOption, MeetWhen, Season } from '../api/types.js';
import type { MeetsUrlFilter } from '../lib/use-meets-filter.js';

export interface MeetsFiltersProps {
  filter: MeetsUrlFilter;
  onChange: (change: Partial<MeetsUrlFilter>) => void;
  seasons: Season[];
  clubs: ClubOption[];
  /** Organisers may filter to meets still being built. */
  showDrafts: boolean;
  narrowed: boolean;
}

// The empty choice ("All seasons") is shown, so the label sits above it.
const filterSlots = { select: { displayEmpty: true }, inputLabel: { shrink: true } } as const;

export function MeetsFilters({ filter, onChange, seasons, clubs, showDrafts, narrowed }: MeetsFiltersProps) {
  const statuses = MEET_STATUSES.filter((status) => showDrafts || status !== 'DRAFT');
  // A value from the address shows only once its option has loaded (MUI refuses unknown values).
  const known = (id: string, list: readonly { id: string }[]) => (list.some((item) => item.id === id) ? id : '');
  return (
    <Stack spacing={2}>
      <Tabs
        value={filter.when}
        onChange={(_event, when: MeetWhen) => onChange({ when })}
        aria-label="Which meets"
        variant="fullWidth"
        sx={{ maxWidth: 420 }}
      >
        <Tab value="UPCOMING" label="Upcoming" />
        <Tab value="PAST" label="Past" />
      </Tabs>
      {/* Three across even on a phone: the list, not the filters, should fill the first screen. */}
      <Box sx={{ display: 'grid', gap: 1, gridTemplateColumns: { xs: 'repeat(3, minmax(0, 1fr))', md: 'repeat(3, minmax(0, 240px)) auto' }, alignItems: 'center' }}>
        <TextField select label="Season" value={known(filter.seasonId, seasons)} onChange={(event) => onChange({ seasonId: event.target.value })} slotProps={filterSlots}>
          <MenuItem value="">All seasons</MenuItem>
          {seasons.map((season) => (
            <MenuItem key={season.id} value={season.id}>
              {season.name}
              {season.isCurrent ? ' (current)' : ''}
            </MenuItem>
          ))}
        </TextField>
        <TextField select label="Club" value={known(filter.clubId, clubs)} onChange={(event) => onChange({ clubId: event.target.value })} slotProps={filterSlots}>
          <MenuItem value="">All clubs</MenuItem>
          {clubs.map((club) => (
            <MenuItem key={club.id} value={club.id}>
              {club.name}
            </MenuItem>
          ))}
        </TextField>
        <TextField select label="Status" value={filter.status} onChange={(event) => onChange({ status: event.target.value as MeetsUrlFilter['status'] })} slotProps={filterSlots}>
          <MenuItem value="">Any status</MenuItem>
          {statuses.map((status) => (
            <MenuItem key={status} value={status}>
              {MEET_STATUS_LABELS[status]}
            </MenuItem>
          ))}
        </TextField>
        {narrowed && (
          <Button onClick={() => onChange({ seasonId: '', clubId: '', status: '' })} sx={{ justifySelf: 'start', gridColumn: { xs: '1 / -1', md: 'auto' } }}>
            Clear filters
          </Button>
        )}
      </Box>
    </Stack>
  );
}
