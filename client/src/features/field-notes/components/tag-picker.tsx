import Autocomplete from '@mui/material/Autocomplete';
import Chip from '@mui/material/Chip';
import TextField from '@mui/material/TextField';

export interface TagOption {
  id: string;
  label: string;
}

export interface TagPickerProps {
  label: string;
  options: readonly TagOption[];
  value: string[];
  onChange: (ids: string[]) => void;
  /** Free tags: anything typed becomes a tag. */
  free?: boolean;
  error?: string;
}

/** Picks several tags from a fixed vocabulary (or free words), shown as chips. */
export function TagPicker({ label, options, value, onChange, free = false, error }: TagPickerProps) {
  const labelOf = (id: string) => options.find((o) => o.id === id)?.label ?? id;
  return (
    <Autocomplete
      multiple
      freeSolo={free}
      options={options.map((o) => o.id)}
      value={value}
      getOptionLabel={labelOf}
      onChange={(_, ids) => onChange(ids.map((id) => (free ? id.trim().toLowerCase() : id)).filter(Boolean))}
      renderValue={(ids, getItemProps) => ids.map((id, index) => <Chip {...getItemProps({ index })} key={id} size="small" label={labelOf(id)} />)}
      renderInput={(params) => <TextField {...params} label={label} error={Boolean(error)} helperText={error ?? (free ? 'Type a word and press Enter.' : undefined)} />}
    />
  );
}
