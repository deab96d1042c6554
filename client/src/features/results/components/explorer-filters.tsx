import { BLOCK_CONDITION_LABELS, BLOCK_CONDITIONS, DIVISION_LABELS, DIVISIONS, HEAD_GRIND_LABELS, HEAD_GRINDS, inchesToMm, listSpecies, mmToInches } from '@endgrain/shared';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import { useState } from 'react';

import type { ExplorerOptions, ResultsFilter, UnitPreference } from '../api/types.js';

export interface ExplorerFiltersProps {
  filter: ResultsFilter;
  options: ExplorerOptions | undefined;
  units: UnitPreference;
  onChange(filter: ResultsFilter): void;
}

const SPECIES = listSpecies();

/** The explorer's filters; lengths are typed in the reader's units and kept in millimetres. */
export function ExplorerFilters({ filter, options, units, onChange }: ExplorerFiltersProps) {
  const set = (change: Partial<ResultsFilter>) => {
    const next: ResultsFilter = { ...filter, ...change };
    for (const key of Object.keys(next) as (keyof ResultsFilter)[]) if (next[key] === '' || next[key] === undefined) delete next[key];
    onChange(next);
  };
  const select = (label: string, key: keyof ResultsFilter, items: { value: string; label: string }[], width = 170) => (
    <TextField select size="small" label={label} value={(filter[key] as string | undefined) ?? ''} onChange={(e) => set({ [key]: e.target.value || undefined })} sx={{ width: { xs: '100%', sm: width } }}>
      <MenuItem value="">Any</MenuItem>
      {items.map((item) => <MenuItem key={item.value} value={item.value}>{item.label}</MenuItem>)}
    </TextField>
  );
  return (
    <Stack direction="row" sx={{ gap: 1.5, flexWrap: 'wrap', alignItems: 'center' }}>
      {select('Season', 'seasonId', (options?.seasons ?? []).map((s) => ({ value: s.id, label: s.name })))}
      {select('Event', 'eventTypeId', (options?.eventTypes ?? []).map((t) => ({ value: t.id, label: t.name })), 190)}
      {select('Division', 'division', DIVISIONS.map((d) => ({ value: d, label: DIVISION_LABELS[d] })), 130)}
      {select('Club', 'clubId', (options?.clubs ?? []).map((c) => ({ value: c.id, label: c.name })), 200)}
      {select('Species', 'speciesId', SPECIES.map((s) => ({ value: s.id, label: s.commonName })), 190)}
      <RangeField label="Diameter" unit={units === 'IMPERIAL' ? 'in' : 'mm'} min={filter.diameterMinMm} max={filter.diameterMaxMm}
        toShown={(mm) => (units === 'IMPERIAL' ? Math.round(mmToInches(mm) * 10) / 10 : Math.round(mm))}
        fromShown={(value) => (units === 'IMPERIAL' ? inchesToMm(value) : value)}
        onChange={(min, max) => set({ diameterMinMm: min, diameterMaxMm: max })} />
      {select('Grind', 'grind', HEAD_GRINDS.map((g) => ({ value: g, label: HEAD_GRIND_LABELS[g] })), 130)}
      <RangeField label="Bevel" unit="°" min={filter.bevelMinDeg} max={filter.bevelMaxDeg} toShown={(v) => v} fromShown={(v) => v}
        onChange={(min, max) => set({ bevelMinDeg: min, bevelMaxDeg: max })} />
      {select('Block', 'condition', BLOCK_CONDITIONS.map((c) => ({ value: c, label: BLOCK_CONDITION_LABELS[c] })), 140)}
      <FormControlLabel control={<Switch checked={Boolean(filter.finishedOnly)} onChange={(e) => set({ finishedOnly: e.target.checked || undefined })} />} label="Finished only" />
      {Object.keys(filter).length > 0 && <Button onClick={() => onChange({})}>Clear filters</Button>}
    </Stack>
  );
}

interface RangeFieldProps {
  label: string;
  unit: string;
  min: number | undefined;
  max: number | undefined;
  toShown(stored: number): number;
  fromShown(shown: number): number;
  onChange(min: number | undefined, max: number | undefined): void;
}

/** A from–to pair that applies when the field is left (or Enter is pressed), not on every key. */
function RangeField({ label, unit, min, max, toShown, fromShown, onChange }: RangeFieldProps) {
  const shown = (value: number | undefined) => (value === undefined ? '' : String(toShown(value)));
  const [from, setFrom] = useState(shown(min));
  const [to, setTo] = useState(shown(max));
  const read = (text: string): number | undefined => {
    const value = Number(text.replace(',', '.'));
    return text.trim() === '' || !Number.isFinite(value) ? undefined : Math.round(fromShown(value) * 100) / 100;
  };
  const apply = () => onChange(read(from), read(to));
  const field = (which: 'from' | 'to') => (
    <TextField
      size="small"
      label={`${which === 'from' ? 'Min' : 'Max'} ${label.toLowerCase()} (${unit})`}
      value={which === 'from' ? from : to}
      onChange={(e) => (which === 'from' ? setFrom : setTo)(e.target.value)}
      onBlur={apply}
      onKeyDown={(e) => e.key === 'Enter' && apply()}
      slotProps={{ htmlInput: { inputMode: 'decimal' } }}
      sx={{ width: { xs: '50%', sm: 160 } }}
    />
  );
  return (
    <Stack direction="row" sx={{ gap: 0.5, width: { xs: '100%', sm: 'auto' } }}>
      {field('from')}
      {field('to')}
    </Stack>
  );
}
