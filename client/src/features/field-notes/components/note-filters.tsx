import { CONDITION_TAGS, EVENT_CATALOGUE, GRIND_TAGS, taggableSpecies } from '@endgrain/shared';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import TextField from '@mui/material/TextField';

import { KIND_PLURALS } from '../lib/note-labels.js';
import type { NoteUrlFilter } from '../lib/use-note-filter.js';

const SPECIES = taggableSpecies();
const KIND_TABS = [['', 'All'], ['FINDING', KIND_PLURALS.FINDING], ['GUIDE', KIND_PLURALS.GUIDE], ['SAFETY_NOTE', KIND_PLURALS.SAFETY_NOTE]] as const;

interface Props {
  filter: NoteUrlFilter;
  active: boolean;
  onChange: (change: Partial<NoteUrlFilter>) => void;
}

function Select({ label, value, options, onChange }: { label: string; value: string; options: { id: string; label: string }[]; onChange: (v: string) => void }) {
  return (
    <TextField select size="small" label={label} value={value} onChange={(e) => onChange(e.target.value)} sx={{ minWidth: 170 }}>
      <MenuItem value="">Any</MenuItem>
      {options.map((o) => (
        <MenuItem key={o.id} value={o.id}>
          {o.label}
        </MenuItem>
      ))}
    </TextField>
  );
}

/** Kind tabs and tag filters for the Field Notes list. */
export function NoteFilters({ filter, active, onChange }: Props) {
  return (
    <Stack spacing={2}>
      <Tabs value={filter.kind} onChange={(_, kind: NoteUrlFilter['kind']) => onChange({ kind })} variant="scrollable" allowScrollButtonsMobile aria-label="Kind of note">
        {KIND_TABS.map(([value, label]) => (
          <Tab key={value} value={value} label={label} sx={{ minHeight: 48 }} />
        ))}
      </Tabs>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1.5, alignItems: 'center' }}>
        <Select label="Species" value={filter.species} options={SPECIES} onChange={(species) => onChange({ species })} />
        <Select label="Block condition" value={filter.condition} options={[...CONDITION_TAGS]} onChange={(condition) => onChange({ condition })} />
        <Select label="Grind" value={filter.grind} options={[...GRIND_TAGS]} onChange={(grind) => onChange({ grind })} />
        <Select label="Event" value={filter.event} options={EVENT_CATALOGUE.map((e) => ({ id: e.code, label: e.name }))} onChange={(event) => onChange({ event })} />
        {active && <Button onClick={() => onChange({ kind: '', species: '', grind: '', event: '', condition: '' })}>Clear filters</Button>}
      </Stack>
    </Stack>
  );
}
