export { BLOCK_CONDITIONS, BLOCK_CONDITION_LABELS, type BlockCondition } from './block-conditions.js';
export { formatCsv } from './format-csv.js';
export { HEAD_GRINDS, HEAD_GRIND_LABELS, type HeadGrind } from './head-grinds.js';
export {
  matchSheetRows,
  type MatchedSheetRow,
  type MatchSheetRows,
  type MeetSheetContext,
  type SheetClub,
  type SheetEntry,
  type SheetMeetEvent,
} from './match-sheet-rows.js';
export { parseCsv, type CsvRecord, type ParsedCsv } from './parse-csv.js';
export { fromScoringStatus, POSTED_STATUSES, POSTED_STATUS_LABELS, toScoringStatus, type PostedStatus } from './posted-statuses.js';
export { MAX_SHEET_ROWS, readResultSheet, type ReadResultSheet } from './read-result-sheet.js';
export { readSheetRow, type ReadSheetRow } from './read-sheet-row.js';
export { readHeader, SHEET_COLUMNS, type SheetColumn, type SheetColumnKey } from './sheet-columns.js';
export { sheetError, type SheetError } from './sheet-error.js';
export type { SheetRow } from './sheet-row.js';
export {
  eventScheme,
  scoreMeetEvent,
  toResultKind,
  type EventScoring,
  type MeetScoring,
  type SchemeValue,
  type StoredResult,
} from './score-meet-event.js';
export { personalBests, type BestCandidate } from './personal-bests.js';
