import TextField, { type TextFieldProps } from '@mui/material/TextField';

export interface CellFieldProps extends Omit<TextFieldProps, 'error' | 'helperText' | 'onChange'> {
  /** Column key: Enter moves to the same column of the next row. */
  column: string;
  row: number;
  problem?: string | undefined;
  onValue(value: string): void;
}

/**
 * One cell of the results table: a labelled input 44 px or taller (meet-day thumbs), with its
 * problem shown beneath it; numbers bring up the phone's decimal keypad.
 */
export function CellField({ column, row, problem, onValue, slotProps, ...props }: CellFieldProps) {
  return (
    <TextField
      {...props}
      size="small"
      error={Boolean(problem)}
      helperText={problem}
      onChange={(event) => onValue(event.target.value)}
      slotProps={{
        ...slotProps,
        htmlInput: { 'data-row': row, 'data-column': column, 'aria-invalid': Boolean(problem), style: { minHeight: 28 }, ...(slotProps?.htmlInput as object | undefined) },
        inputLabel: { shrink: true },
      }}
      sx={{ '& .MuiInputBase-root': { minHeight: 44 }, ...props.sx }}
    />
  );
}
