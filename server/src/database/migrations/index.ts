import { AccountsAndLeague1764600000000 } from './1764600000000-accounts-and-league.js';
import { MeetsAndEntries1764700000000 } from './1764700000000-meets-and-entries.js';
import { Rack1764800000000 } from './1764800000000-rack.js';
import { Results1764900000000 } from './1764900000000-results.js';
import { ResultsExplorerIndexes1764900000001 } from './1764900000001-results-explorer-indexes.js';
import { FieldNotes1765000000000 } from './1765000000000-field-notes.js';
import { Trials1765100000000 } from './1765100000000-trials.js';
import { Insights1765200000000 } from './1765200000000-insights.js';
import { MeetTimekeepers1765300000000 } from './1765300000000-meet-timekeepers.js';

/** Every migration in order; the only way the schema changes. */
export const MIGRATIONS = [AccountsAndLeague1764600000000, MeetsAndEntries1764700000000, Rack1764800000000, Results1764900000000, ResultsExplorerIndexes1764900000001, FieldNotes1765000000000, Trials1765100000000, Insights1765200000000, MeetTimekeepers1765300000000];
