import { DIVISIONS, formatTime, inchesToMm, mmToInches, parseTime } from '@endgrain/shared';
import { z } from 'zod';

import type { MeetEvent, MeetEventInput, UnitPreference } from '../api/types.js';
import { parsePointsTable } from '../lib/points-table.js';

export type LengthUnit = 'mm' | 'in';

const decimal = (text: string) => Number(text.trim().replace(',', '.'));

/** The typed diameter in millimetres, converted exactly from inches when the toggle says so. */
export function diameterInMm(text: string, unit: LengthUnit): number | null {
  if (text.trim() === '') return null;
  const value = decimal(text);
  if (!Number.isFinite(value)) return Number.NaN;
  return unit === 'in' ? inchesToMm(value) : value;
}

// Limits and wording from the server (server/src/meets/meet.validation.ts).
export const eventFormSchema = z
  .object({
    eventTypeId: z.string().min(1, 'Pick an event from the catalogue.'),
    division: z.union([z.enum(DIVISIONS), z.literal('')]).refine((value) => value.length > 0, 'Pick a division.'),
    speciesId: z.string(),
    diameter: z.string(),
    diameterUnit: z.enum(['mm', 'in']),
    timeLimit: z.string(),
    weight: z.string().refine((text) => {
      const value = decimal(text);
      return text.trim() !== '' && value > 0 && value <= 10;
    }, 'Event weight must be more than 0 and at most 10 (for example 1.5).'),
    // "MEET" scores the event like the rest of the meet; anything else overrides it for this event.
    scoring: z.enum(['MEET', 'FIXED_TABLE', 'FIELD_SIZE', 'PERCENT_OF_BEST']),
    pointsTable: z.string(),
    notes: z.string().max(400, 'Keep the notes under 400 characters.'),
  })
  .superRefine((values, context) => {
    if (values.scoring === 'FIXED_TABLE') {
      const parsed = parsePointsTable(values.pointsTable);
      if (!parsed.ok) context.addIssue({ code: 'custom', path: ['pointsTable'], message: parsed.message });
    }
    const mm = diameterInMm(values.diameter, values.diameterUnit);
    if (mm !== null && !(mm >= 50 && mm <= 1500)) {
      context.addIssue({ code: 'custom', path: ['diameter'], message: 'Block diameter must be between 50 mm (2 in) and 1500 mm (59 in).' });
    }
    if (values.timeLimit.trim() !== '') {
      const parsed = parseTime(values.timeLimit);
      if (!parsed.ok) context.addIssue({ code: 'custom', path: ['timeLimit'], message: `${parsed.message}. Write it like 1:30.00 or 90.` });
      else if (parsed.hundredths < 1 || parsed.hundredths > 360000) {
        context.addIssue({ code: 'custom', path: ['timeLimit'], message: 'A time limit runs from 0.01 to 60:00.00.' });
      }
    }
  });

export type EventFormValues = z.infer<typeof eventFormSchema>;

/** Server field names → this form's fields (the server speaks millimetres and hundredths). */
export const EVENT_SERVER_FIELDS = {
  eventTypeId: 'eventTypeId',
  division: 'division',
  speciesId: 'speciesId',
  diameterMm: 'diameter',
  timeLimitHundredths: 'timeLimit',
  weight: 'weight',
  scoringScheme: 'scoring',
  pointsTable: 'pointsTable',
  notes: 'notes',
} as const satisfies Record<string, keyof EventFormValues>;

export function eventFormDefaults(event: MeetEvent | undefined, units: UnitPreference): EventFormValues {
  const unit: LengthUnit = units === 'IMPERIAL' ? 'in' : 'mm';
  const diameter = event?.diameterMm == null ? '' : String(unit === 'in' ? Math.round(mmToInches(event.diameterMm) * 100) / 100 : event.diameterMm);
  return {
    eventTypeId: event?.eventType.id ?? '',
    division: event?.division ?? '',
    speciesId: event?.speciesId ?? '',
    diameter,
    diameterUnit: unit,
    timeLimit: event?.timeLimitHundredths == null ? '' : formatTime(event.timeLimitHundredths),
    weight: String(event?.weight ?? 1),
    scoring: event?.scoringScheme ?? 'MEET',
    pointsTable: event?.pointsTable?.join(', ') ?? '',
    notes: event?.notes ?? '',
  };
}

/** Checked values as the API's input: millimetres, hundredths, nulls for blanks. */
export function toMeetEventInput(values: EventFormValues): MeetEventInput {
  const mm = diameterInMm(values.diameter, values.diameterUnit);
  const limit = values.timeLimit.trim() === '' ? undefined : parseTime(values.timeLimit);
  return {
    eventTypeId: values.eventTypeId,
    division: values.division as MeetEventInput['division'],
    speciesId: values.speciesId || null,
    diameterMm: mm === null ? null : Math.round(mm * 10) / 10,
    timeLimitHundredths: limit?.ok ? limit.hundredths : null,
    weight: decimal(values.weight),
    scoringScheme: values.scoring === 'MEET' ? null : values.scoring,
    pointsTable: values.scoring === 'FIXED_TABLE' ? ((p) => (p.ok ? p.points : null))(parsePointsTable(values.pointsTable)) : null,
    notes: values.notes.trim(),
  };
}
