import { choiceKey } from './read-choice.js';
import { sheetError, type SheetError } from './sheet-error.js';

export type SheetColumnKey =
  | 'event' | 'division' | 'club' | 'athletes' | 'time' | 'time2' | 'time3' | 'score' | 'penalty' | 'status'
  | 'reason' | 'axeLabel' | 'grind' | 'bevelAngle' | 'chiselWidth' | 'species' | 'diameter' | 'condition';

export interface SheetColumn {
  key: SheetColumnKey;
  /** The documented header; errors name the column by it. */
  name: string;
  aliases: readonly string[];
  required: boolean;
  /** What goes in it, for the import guide and the upload screen. */
  help: string;
  example: string;
}

/** The results sheet's columns, in the order the import guide lists them. */
export const SHEET_COLUMNS: readonly SheetColumn[] = [
  { key: 'event', name: 'event', aliases: [], required: true, help: "The event's name or catalogue code, as in the meet.", example: 'Underhand chop' },
  { key: 'division', name: 'division', aliases: [], required: true, help: "Men's, Women's or Mixed.", example: "Men's" },
  { key: 'club', name: 'club', aliases: ['team'], required: true, help: "The club's name or short name.", example: 'LARCH' },
  { key: 'athletes', name: 'athletes', aliases: ['athlete', 'names'], required: true, help: 'Full names as entered; pairs and teams joined with " & ".', example: 'Maren Ashgrove & Bram Dunmere' },
  { key: 'time', name: 'time', aliases: ['time 1'], required: false, help: 'A stopwatch time, m:ss.hh or ss.hh; two or three watches may share the cell, split by "/".', example: '41.37 / 41.52' },
  { key: 'time2', name: 'time 2', aliases: [], required: false, help: 'A second watch, when watches have their own columns.', example: '41.52' },
  { key: 'time3', name: 'time 3', aliases: [], required: false, help: 'A third watch.', example: '41.40' },
  { key: 'score', name: 'score', aliases: ['hits'], required: false, help: 'Points in a scored event, or the hit count in a fewest-hits event.', example: '17' },
  { key: 'penalty', name: 'penalty', aliases: ['penalty seconds'], required: false, help: 'Penalty seconds added to the time; empty for none.', example: '5' },
  { key: 'status', name: 'status', aliases: ['result'], required: false, help: 'finished, scratch (no time), did not finish or disqualified; empty reads as finished.', example: 'finished' },
  { key: 'reason', name: 'reason', aliases: ['dq reason'], required: false, help: 'Why a result was disqualified (needed for a disqualification).', example: 'stepped over the line' },
  { key: 'axeLabel', name: 'axe label', aliases: ['axe'], required: false, help: "The axe's label in the club's rack.", example: 'Race 3' },
  { key: 'grind', name: 'grind', aliases: [], required: false, help: 'flat, convex, chisel or compound.', example: 'convex' },
  { key: 'bevelAngle', name: 'bevel angle', aliases: ['bevel'], required: false, help: 'Included bevel angle in degrees (both faces).', example: '32' },
  { key: 'chiselWidth', name: 'chisel width', aliases: ['chisel'], required: false, help: 'Chisel (secondary bevel) width with its unit.', example: '6 mm' },
  { key: 'species', name: 'species', aliases: [], required: false, help: "The block's species; empty takes the meet event's.", example: 'eastern white pine' },
  { key: 'diameter', name: 'diameter', aliases: [], required: false, help: "The block's diameter with its unit; empty takes the meet event's.", example: '12 in' },
  { key: 'condition', name: 'condition', aliases: ['block condition'], required: false, help: 'green (or wet), seasoned, dry, punky, frozen or knotty.', example: 'seasoned' },
];

const BY_SPELLING = new Map(
  SHEET_COLUMNS.flatMap((column) => [column.name, ...column.aliases].map((spelling) => [choiceKey(spelling), column] as const)),
);

export type ReadHeader = { ok: true; columns: Map<SheetColumnKey, number> } | { ok: false; errors: SheetError[] };

/** Maps the header row to column positions; headers are matched whatever their case or spacing. */
export function readHeader(fields: readonly string[]): ReadHeader {
  const columns = new Map<SheetColumnKey, number>();
  const errors: SheetError[] = [];
  fields.forEach((field, index) => {
    if (field.trim() === '') return;
    const column = BY_SPELLING.get(choiceKey(field));
    if (!column) errors.push(sheetError(1, field.trim(), 'is not a column Endgrain reads (see the import guide)'));
    else if (columns.has(column.key)) errors.push(sheetError(1, column.name, 'appears twice in the header'));
    else columns.set(column.key, index);
  });
  for (const column of SHEET_COLUMNS) {
    if (column.required && !columns.has(column.key)) errors.push(sheetError(1, column.name, `the sheet needs a "${column.name}" column`));
  }
  if (!['time', 'score', 'status'].some((key) => columns.has(key as SheetColumnKey))) {
    errors.push(sheetError(1, 'time', 'the sheet needs a "time", "score" or "status" column'));
  }
  return errors.length ? { ok: false, errors } : { ok: true, columns };
}
