import InputAdornment from '@mui/material/InputAdornment';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { Controller, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';

import { FormTextField } from '../../../components/ui/form-text-field.js';
import type { EventFormValues, LengthUnit } from '../schemas/event-form-schema.js';

export interface DiameterFieldProps {
  control: Control<EventFormValues>;
  register: UseFormRegister<EventFormValues>;
  errors: FieldErrors<EventFormValues>;
  hint: string | undefined;
}

/** The block diameter with its unit beside it: the toggle starts at the member's preference. */
export function DiameterField({ control, register, errors, hint }: DiameterFieldProps) {
  return (
    <FormTextField
      label="Block diameter (optional)"
      registration={register('diameter')}
      fieldError={errors.diameter}
      helperText={hint}
      slotProps={{
        htmlInput: { inputMode: 'decimal', autoComplete: 'off' },
        input: {
          endAdornment: (
            <InputAdornment position="end">
              <Controller
                control={control}
                name="diameterUnit"
                render={({ field }) => (
                  <ToggleButtonGroup
                    exclusive
                    size="small"
                    color="primary"
                    aria-label="Diameter unit"
                    value={field.value}
                    onChange={(_event, unit: LengthUnit | null) => unit && field.onChange(unit)}
                  >
                    <ToggleButton value="mm" aria-label="millimetres">
                      mm
                    </ToggleButton>
                    <ToggleButton value="in" aria-label="inches">
                      in
                    </ToggleButton>
                  </ToggleButtonGroup>
                )}
              />
            </InputAdornment>
          ),
        },
      }}
    />
  );
}
