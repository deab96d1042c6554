import { BEVEL_BANDS, CHISEL_BANDS } from '@endgrain/shared';
import Box from '@mui/material/Box';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';

import type { GrainOptions } from '../api/types.js';
import type { GrainUrlFilter } from '../lib/use-grain-filter.js';
import { sentenceCase } from '../../../lib/sentence-case.js';

const CONDITIONS = ['green', 'seasoned', 'dry', 'punky', 'frozen', 'knotty'];
const DIVISIONS = [['MENS', "Men's"], ['WOMENS', "Women's"], ['MIXED', 'Mixed']] as const;
const slots = { select: { displayEmpty: true }, inputLabel: { shrink: true } } as const;
const multi = { select: { multiple: true, displayEmpty: true, renderValue: (v: unknown) => ((v as string[]).length ? `${(v as string[]).length} chosen` : 'All') }, inputLabel: { shrink: true } } as const;

export interface GrainFiltersProps {
  filter: GrainUrlFilter;
  onChange: (change: Partial<GrainUrlFilter>) => void;
  options: GrainOptions;
  /** The woods in the current map, for the species choice. */
  species?: { speciesId: string; name: string }[];
}

/** Event, division, seasons, clubs, condition, diameter range, angle band and chisel band. */
export function GrainFilters({ filter, onChange, options, species = [] }: GrainFiltersProps) {
  const events = options.eventTypes.filter((e) => e.resultKind === 'TIMED' && e.teamSize === 1);
  return (
    <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: { xs: 'repeat(2, minmax(0, 1fr))', md: 'repeat(5, minmax(0, 1fr))' } }} role="group" aria-label="Grain Map filters">
      <TextField select label="Event" value={events.some((e) => e.id === filter.event) ? filter.event : ''} onChange={(e) => onChange({ event: e.target.value, cell: '' })} slotProps={slots}>
        {events.map((e) => <MenuItem key={e.id} value={e.id}>{e.name}</MenuItem>)}
      </TextField>
      <TextField select label="Division" value={filter.division} onChange={(e) => onChange({ division: e.target.value })} slotProps={slots}>
        <MenuItem value="">All divisions</MenuItem>
        {DIVISIONS.map(([id, label]) => <MenuItem key={id} value={id}>{label}</MenuItem>)}
      </TextField>
      <TextField select label="Seasons" value={filter.seasons} onChange={(e) => onChange({ seasons: e.target.value as unknown as string[] })} slotProps={multi}>
        {options.seasons.map((s) => <MenuItem key={s.id} value={s.id}>{s.name}</MenuItem>)}
      </TextField>
      <TextField select label="Clubs" value={filter.clubs} onChange={(e) => onChange({ clubs: e.target.value as unknown as string[] })} slotProps={multi}>
        {options.clubs.map((c) => <MenuItem key={c.id} value={c.id}>{c.name}</MenuItem>)}
      </TextField>
      <TextField select label="Species" value={species.some((s) => s.speciesId === filter.species) ? filter.species : ''} onChange={(e) => onChange({ species: e.target.value, cell: '' })} slotProps={slots}>
        <MenuItem value="">All species</MenuItem>
        {species.map((s) => <MenuItem key={s.speciesId} value={s.speciesId}>{sentenceCase(s.name)}</MenuItem>)}
      </TextField>
      <TextField select label="Block condition" value={filter.condition} onChange={(e) => onChange({ condition: e.target.value })} slotProps={slots}>
        <MenuItem value="">Any condition</MenuItem>
        {CONDITIONS.map((c) => <MenuItem key={c} value={c}>{c}</MenuItem>)}
      </TextField>
      <TextField label="Diameter from (mm)" value={filter.dmin} onChange={(e) => onChange({ dmin: e.target.value })} slotProps={{ htmlInput: { inputMode: 'decimal' } }} />
      <TextField label="Diameter to (mm)" value={filter.dmax} onChange={(e) => onChange({ dmax: e.target.value })} slotProps={{ htmlInput: { inputMode: 'decimal' } }} />
      <TextField select label="Bevel angle" value={filter.angle} onChange={(e) => onChange({ angle: e.target.value })} slotProps={slots}>
        <MenuItem value="">Any angle</MenuItem>
        {BEVEL_BANDS.map((b) => <MenuItem key={b.id} value={b.id}>{b.label}</MenuItem>)}
      </TextField>
      <TextField select label="Chisel width" value={filter.chisel} onChange={(e) => onChange({ chisel: e.target.value })} slotProps={slots}>
        <MenuItem value="">Any chisel</MenuItem>
        {CHISEL_BANDS.map((b) => <MenuItem key={b.id} value={b.id}>{b.label}</MenuItem>)}
      </TextField>
    </Box>
  );
}
