import Add from '@mui/icons-material/Add';
import Autocomplete from '@mui/material/Autocomplete';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import FormHelperText from '@mui/material/FormHelperText';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';

import { newId } from '../../lib/new-id.js';
import type { DraftTester } from '../../lib/trial-draft.js';

const CHIP_LIMIT = 24;

export interface TestersFieldProps {
  testers: DraftTester[];
  athletes: { id: string; name: string }[];
  /** Testers who already swung: they stay while their runs do. */
  locked: ReadonlySet<string>;
  hint: string | undefined;
  onChange: (testers: DraftTester[]) => void;
}

/** Who swings on the block: tap roster names, or add someone who is not on the roster. */
export function TestersField({ testers, athletes, locked, hint, onChange }: TestersFieldProps) {
  const [name, setName] = useState('');
  const headingId = useId();
  const chosen = new Map(testers.filter((t) => t.athleteId).map((t) => [t.athleteId!, t]));
  const toggle = (athlete: { id: string; name: string }) => {
    const existing = chosen.get(athlete.id);
    if (existing) {
      if (!locked.has(existing.id)) onChange(testers.filter((t) => t.id !== existing.id));
    } else {
      onChange([...testers, { id: newId(), athleteId: athlete.id, name: athlete.name }]);
    }
  };
  const addName = () => {
    const clean = name.trim().replace(/\s+/g, ' ');
    if (!clean) return;
    onChange([...testers, { id: newId(), athleteId: null, name: clean }]);
    setName('');
  };
  const guests = testers.filter((t) => !t.athleteId);
  // A club's roster fits as chips; a long one would bury the form, so it gets a search box instead.
  const shown = athletes.length > CHIP_LIMIT ? athletes.filter((a) => chosen.has(a.id)) : athletes;
  return (
    <Stack spacing={1.5} role="group" aria-labelledby={headingId}>
      <Typography id={headingId} variant="subtitle1" component="h3">
        Testers
      </Typography>
      {athletes.length > CHIP_LIMIT && (
        <Autocomplete
          options={athletes.filter((a) => !chosen.has(a.id))}
          getOptionLabel={(a) => a.name}
          value={null}
          onChange={(_e, a) => a && toggle(a)}
          renderInput={(params) => <TextField {...params} label="Add a tester from the roster" />}
          blurOnSelect
        />
      )}
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
        {shown.map((a) => {
          const picked = chosen.get(a.id);
          return (
            <Chip
              key={a.id}
              label={a.name}
              color={picked ? 'primary' : 'default'}
              variant={picked ? 'filled' : 'outlined'}
              aria-pressed={Boolean(picked)}
              onClick={() => toggle(a)}
              sx={{ minHeight: 44, fontSize: '0.95rem' }}
            />
          );
        })}
        {guests.map((t) => (
          <Chip key={t.id} label={t.name} color="primary" onDelete={locked.has(t.id) ? undefined : () => onChange(testers.filter((x) => x.id !== t.id))} sx={{ minHeight: 44, fontSize: '0.95rem' }} />
        ))}
      </Stack>
      {locked.size > 0 && <FormHelperText>Testers who have swung stay on the list while their axes do.</FormHelperText>}
      <Stack direction="row" spacing={1}>
        <TextField
          label="Someone not on the roster"
          value={name}
          onChange={(e) => setName(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault();
              addName();
            }
          }}
          sx={{ flex: 1 }}
        />
        <Button variant="outlined" startIcon={<Add />} onClick={addName} disabled={!name.trim()}>
          Add
        </Button>
      </Stack>
      {hint && <FormHelperText>{hint}</FormHelperText>}
    </Stack>
  );
}
