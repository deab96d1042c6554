/** One problem in an uploaded results sheet, named by spreadsheet row and column. */
export interface SheetError {
  row: number;
  /** The column's name as Endgrain documents it (lower case), or "file" for the file itself. */
  column: string;
  /** Whole sentence, fit for a script's log: `row 7, time: "1:5.3" is not m:ss.hh`. */
  message: string;
}

export function sheetError(row: number, column: string, problem: string): SheetError {
  return { row, column, message: `row ${row}, ${column}: ${problem}` };
}
