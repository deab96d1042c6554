import Checkbox from '@mui/material/Checkbox';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import Typography from '@mui/material/Typography';
import { useId } from 'react';
import { Controller, type Control } from 'react-hook-form';

import type { RosterAthlete } from '../api/types.js';

export interface AthleteChecklistProps {
  control: Control<{ athleteIds: string[] }>;
  athletes: RosterAthlete[];
  teamSize: number;
  alreadyIn: ReadonlySet<string>;
  /** The rule the pick breaks, from the form or the server; read out as soon as it appears. */
  error: string | undefined;
  label: string;
  /** Said when the list is empty. */
  emptyText: string;
}

/**
 * One row per athlete, tall enough for a thumb. For a single event a new tick replaces the old one;
 * for pairs and teams the list stops taking ticks once it is full.
 */
export function AthleteChecklist({ control, athletes, teamSize, alreadyIn, error, label, emptyText }: AthleteChecklistProps) {
  const labelId = useId();
  if (athletes.length === 0) {
    return <Typography>{emptyText}</Typography>;
  }
  return (
    <Controller
      control={control}
      name="athleteIds"
      render={({ field }) => {
        const picked = field.value;
        const toggle = (id: string) => {
          if (picked.includes(id)) field.onChange(picked.filter((candidate) => candidate !== id));
          else field.onChange(teamSize === 1 ? [id] : [...picked, id]);
        };
        return (
          <FormControl component="fieldset" error={Boolean(error)} aria-labelledby={labelId}>
            <FormLabel id={labelId} component="legend">
              {label}
            </FormLabel>
            <FormGroup>
              {athletes.map((athlete) => {
                const entered = alreadyIn.has(athlete.id);
                const full = teamSize > 1 && picked.length >= teamSize && !picked.includes(athlete.id);
                return (
                  <FormControlLabel
                    key={athlete.id}
                    sx={{ minHeight: 48, mr: 0 }}
                    disabled={entered || full}
                    label={entered ? `${athlete.name} (already entered)` : athlete.name}
                    control={<Checkbox checked={picked.includes(athlete.id)} onChange={() => toggle(athlete.id)} />}
                  />
                );
              })}
            </FormGroup>
            {error && <FormHelperText role="alert">{error}</FormHelperText>}
          </FormControl>
        );
      }}
    />
  );
}
