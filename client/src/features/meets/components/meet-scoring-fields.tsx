import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormLabel from '@mui/material/FormLabel';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import Stack from '@mui/material/Stack';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { useTheme } from '@mui/material/styles';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useId } from 'react';
import { Controller, useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';

import { FormTextField } from '../../../components/ui/form-text-field.js';
import type { MeetFormValues } from '../schemas/meet-form-schema.js';

const SCHEMES = [
  { value: 'FIXED_TABLE', label: 'Fixed table', hint: 'Each place earns the points in a table, such as 7-6-5-4-3-2-1.' },
  { value: 'FIELD_SIZE', label: 'Field size', hint: 'First earns as many points as there are clubs in the event, each place one less.' },
  { value: 'PERCENT_OF_BEST', label: 'Percentage of the best', hint: 'The winner scores 100, everyone else 100 × best ÷ own.' },
] as const;

const OPTIONS = [
  { name: 'bestEntryPerClub', label: "Only each club's best entry in an event scores" },
  { name: 'minimumOnePoint', label: 'Every club that enters an event earns at least one point' },
  { name: 'requireMixedPairs', label: 'Mixed pairs must be one woman and one man' },
] as const;

export interface MeetScoringFieldsProps {
  control: Control<MeetFormValues>;
  register: UseFormRegister<MeetFormValues>;
  errors: FieldErrors<MeetFormValues>;
}

export function MeetScoringFields({ control, register, errors }: MeetScoringFieldsProps) {
  const theme = useTheme();
  // Three long labels do not fit side by side on a phone: stack them full width there.
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const schemeId = useId();
  const tableId = useId();
  const scheme = useWatch({ control, name: 'scoringScheme' });
  const preset = useWatch({ control, name: 'tablePreset' });
  return (
    <>
      <Stack spacing={0.5}>
        <FormLabel id={schemeId}>Scoring scheme</FormLabel>
        <Controller
          control={control}
          name="scoringScheme"
          render={({ field }) => (
            <RadioGroup aria-labelledby={schemeId} value={field.value} onChange={(_event, value) => field.onChange(value)}>
              {SCHEMES.map((option) => (
                <FormControlLabel
                  key={option.value}
                  value={option.value}
                  control={<Radio />}
                  sx={{ alignItems: 'flex-start', my: 0.5, '& .MuiRadio-root': { mt: -0.75 } }}
                  label={
                    <span>
                      {option.label}
                      <Typography component="span" variant="body2" sx={{ display: 'block', color: 'text.secondary' }}>
                        {option.hint}
                      </Typography>
                    </span>
                  }
                />
              ))}
            </RadioGroup>
          )}
        />
      </Stack>
      {scheme === 'FIXED_TABLE' && (
        <Stack spacing={1}>
          <FormLabel id={tableId}>Points table</FormLabel>
          <Controller
            control={control}
            name="tablePreset"
            render={({ field }) => (
              <ToggleButtonGroup
                exclusive
                color="primary"
                aria-labelledby={tableId}
                value={field.value}
                onChange={(_event, value: MeetFormValues['tablePreset'] | null) => value && field.onChange(value)}
                orientation={phone ? 'vertical' : 'horizontal'}
                fullWidth={phone}
              >
                <ToggleButton value="7-6-5-4-3-2-1">7-6-5-4-3-2-1</ToggleButton>
                <ToggleButton value="5-4-3-2-1-0">5-4-3-2-1-0</ToggleButton>
                <ToggleButton value="custom">Custom</ToggleButton>
              </ToggleButtonGroup>
            )}
          />
          {preset === 'custom' && (
            <FormTextField
              label="Custom points, first place first"
              placeholder="10, 8, 6, 4, 2, 1"
              registration={register('pointsTable')}
              fieldError={errors.pointsTable}
              slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' } }}
            />
          )}
        </Stack>
      )}
      <Stack>
        {OPTIONS.map((option) => (
          <Controller
            key={option.name}
            control={control}
            name={option.name}
            render={({ field }) => (
              <FormControlLabel
                sx={{ minHeight: 44 }}
                label={option.label}
                control={<Checkbox checked={field.value} onChange={(_event, checked) => field.onChange(checked)} slotProps={{ input: { ref: field.ref } }} />}
              />
            )}
          />
        ))}
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
        <FormTextField
          label="Run-offs for ties in the top places"
          registration={register('runOffTopPlaces')}
          fieldError={errors.runOffTopPlaces}
          helperText="How many top places a tie is run off for; 0 to split the points."
          slotProps={{ htmlInput: { inputMode: 'numeric' } }}
        />
        <FormTextField
          label="Events per athlete (optional)"
          registration={register('maxEventsPerAthlete')}
          fieldError={errors.maxEventsPerAthlete}
          helperText="Leave blank for no limit."
          slotProps={{ htmlInput: { inputMode: 'numeric' } }}
        />
      </Stack>
    </>
  );
}
