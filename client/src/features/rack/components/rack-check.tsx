import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';

/** A labelled checkbox bound to react-hook-form. */
export function RackCheck<T extends FieldValues>({ control, name, label }: { control: Control<T>; name: Path<T>; label: string }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => <FormControlLabel label={label} control={<Checkbox checked={Boolean(field.value)} onChange={(event) => field.onChange(event.target.checked)} onBlur={field.onBlur} />} />}
    />
  );
}
