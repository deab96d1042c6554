import { DIVISIONS } from '@endgrain/shared';
import { z } from 'zod';

import type { MeetInput, MeetSummary } from '../api/types.js';
import { fromLocalInput, toLocalInput } from '../lib/local-date-time.js';
import { parsePointsTable, POINTS_TABLE_PRESETS, presetOf } from '../lib/points-table.js';

// The server's rules and wording (server/src/meets/meets.service.ts), checked here first so the
// organiser hears about them beside the field; the server still checks everything.
const wholeNumberText = (label: string, min: number, max: number, { optional = false } = {}) =>
  z.string().refine(
    (text) => (optional && text.trim() === '') || (/^\d+$/.test(text.trim()) && Number(text) >= min && Number(text) <= max),
    `${label} must be a whole number from ${min} to ${max}.`,
  );

export const meetFormSchema = z
  .object({
    name: z.string().trim().min(1, 'Meet name is required.').min(3, 'Meet name must be at least 3 characters.').max(120, 'Meet name must be at most 120 characters.'),
    seasonId: z.string().min(1, 'Pick a season.'),
    hostClubId: z.string().min(1, 'Pick the host club.'),
    startsOn: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Pick the meet date.'),
    venue: z.string().trim().min(1, 'Venue is required.').min(2, 'Venue must be at least 2 characters.').max(160, 'Venue must be at most 160 characters.'),
    entryDeadline: z.string().refine((text) => fromLocalInput(text) !== null, 'Pick the day and time entries close.'),
    divisions: z.array(z.enum(DIVISIONS)).min(1, 'Pick at least one division.'),
    scoringScheme: z.enum(['FIXED_TABLE', 'FIELD_SIZE', 'PERCENT_OF_BEST']),
    tablePreset: z.enum(['7-6-5-4-3-2-1', '5-4-3-2-1-0', 'custom']),
    /** The custom table as typed; named like the server's field so its errors land here. */
    pointsTable: z.string(),
    bestEntryPerClub: z.boolean(),
    minimumOnePoint: z.boolean(),
    runOffTopPlaces: wholeNumberText('Run-off places', 0, 10),
    maxEventsPerAthlete: wholeNumberText('Events per athlete', 1, 30, { optional: true }),
    requireMixedPairs: z.boolean(),
    reason: z.string().max(180, 'Keep the reason under 180 characters.'),
  })
  .superRefine((values, context) => {
    // The datetime-local text starts with the local day, which is the day the organiser means.
    if (values.startsOn && fromLocalInput(values.entryDeadline) && values.entryDeadline.slice(0, 10) > values.startsOn) {
      context.addIssue({ code: 'custom', path: ['entryDeadline'], message: 'Entries must close on or before the meet day.' });
    }
    if (values.scoringScheme === 'FIXED_TABLE' && values.tablePreset === 'custom') {
      const parsed = parsePointsTable(values.pointsTable);
      if (!parsed.ok) context.addIssue({ code: 'custom', path: ['pointsTable'], message: parsed.message });
    }
  });

export type MeetFormValues = z.infer<typeof meetFormSchema>;

/** The form's fields a server error may name. */
export const MEET_FORM_FIELDS = [
  'name',
  'seasonId',
  'hostClubId',
  'startsOn',
  'venue',
  'entryDeadline',
  'divisions',
  'pointsTable',
  'runOffTopPlaces',
  'maxEventsPerAthlete',
  'reason',
] as const satisfies ReadonlyArray<keyof MeetFormValues>;

export function meetFormDefaults(meet: MeetSummary | undefined, currentSeasonId = ''): MeetFormValues {
  const preset = meet ? presetOf(meet.pointsTable) : '7-6-5-4-3-2-1';
  return {
    name: meet?.name ?? '',
    seasonId: meet?.seasonId ?? currentSeasonId,
    hostClubId: meet?.hostClubId ?? '',
    startsOn: meet?.startsOn ?? '',
    venue: meet?.venue ?? '',
    entryDeadline: meet ? toLocalInput(meet.entryDeadline) : '',
    divisions: meet?.divisions ?? ['MENS', 'WOMENS', 'MIXED'],
    scoringScheme: meet?.scoringScheme ?? 'FIXED_TABLE',
    tablePreset: preset ?? 'custom',
    pointsTable: preset || !meet?.pointsTable ? '' : meet.pointsTable.join(', '),
    bestEntryPerClub: meet?.bestEntryPerClub ?? false,
    minimumOnePoint: meet?.minimumOnePoint ?? false,
    runOffTopPlaces: String(meet?.runOffTopPlaces ?? 0),
    maxEventsPerAthlete: meet?.maxEventsPerAthlete == null ? '' : String(meet.maxEventsPerAthlete),
    requireMixedPairs: meet?.requireMixedPairs ?? true,
    reason: '',
  };
}

/** Checked form values as the API's MeetInput. */
export function toMeetInput(values: MeetFormValues): MeetInput {
  let pointsTable: number[] | null = null;
  if (values.scoringScheme === 'FIXED_TABLE') {
    const parsed = values.tablePreset === 'custom' ? parsePointsTable(values.pointsTable) : undefined;
    pointsTable = values.tablePreset === 'custom' ? (parsed?.ok ? parsed.points : []) : [...POINTS_TABLE_PRESETS[values.tablePreset]];
  }
  return {
    name: values.name.trim(),
    seasonId: values.seasonId,
    hostClubId: values.hostClubId,
    startsOn: values.startsOn,
    venue: values.venue.trim(),
    entryDeadline: fromLocalInput(values.entryDeadline) ?? values.entryDeadline,
    divisions: values.divisions,
    scoringScheme: values.scoringScheme,
    pointsTable,
    bestEntryPerClub: values.bestEntryPerClub,
    minimumOnePoint: values.minimumOnePoint,
    runOffTopPlaces: Number(values.runOffTopPlaces),
    maxEventsPerAthlete: values.maxEventsPerAthlete.trim() === '' ? null : Number(values.maxEventsPerAthlete),
    requireMixedPairs: values.requireMixedPairs,
    reason: values.reason.trim() || null,
  };
}
