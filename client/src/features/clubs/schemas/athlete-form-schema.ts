import { DIVISIONS, EXPERIENCE_LEVELS } from '@endgrain/shared';
import { z } from 'zod';

import type { Athlete, AthleteInput } from '../api/types.js';

// The server's rules and wording (server/src/league/clubs.service.ts), so the coach hears first.
const name = (label: string) =>
  z.string().trim().min(1, `${label} is required.`).max(60, `${label} must be at most 60 characters.`);

export const athleteFormSchema = z.object({
  firstName: name('First name'),
  lastName: name('Last name'),
  divisions: z.array(z.enum(DIVISIONS)).min(1, 'Pick at least one division.'),
  experience: z.enum(EXPERIENCE_LEVELS),
  firstSeasonYear: z
    .string()
    .refine((text) => text.trim() === '' || (/^\d{4}$/.test(text.trim()) && Number(text) >= 1950 && Number(text) <= 2100), 'First season must be a year such as 2025.'),
});

export type AthleteFormValues = z.infer<typeof athleteFormSchema>;

export const ATHLETE_FORM_FIELDS = ['firstName', 'lastName', 'divisions', 'experience', 'firstSeasonYear'] as const;

export function athleteFormDefaults(athlete?: Athlete): AthleteFormValues {
  return {
    firstName: athlete?.firstName ?? '',
    lastName: athlete?.lastName ?? '',
    divisions: athlete?.divisions ?? [],
    experience: athlete?.experience ?? 'ROOKIE',
    firstSeasonYear: athlete?.firstSeasonYear == null ? '' : String(athlete.firstSeasonYear),
  };
}

export function toAthleteInput(clubId: string, values: AthleteFormValues): AthleteInput {
  return {
    clubId,
    firstName: values.firstName.trim(),
    lastName: values.lastName.trim(),
    divisions: values.divisions,
    experience: values.experience,
    firstSeasonYear: values.firstSeasonYear.trim() === '' ? null : Number(values.firstSeasonYear),
  };
}
