import { z } from 'zod';

import type { ClubDetail } from '../api/types.js';

// The server's limits and wording (server/src/league/clubs.service.ts and league.validation.ts).
const text = (label: string, min: number, max: number) =>
  z.string().trim().min(min, min === 1 ? `${label} is required.` : `${label} needs at least ${min} characters.`).max(max, `${label} must be at most ${max} characters.`);
const colour = z.string().regex(/^#[0-9a-fA-F]{6}$/, 'Colours are written #rrggbb, for example #2f5d3a.');

export const clubFormSchema = z.object({
  name: text('Club name', 3, 120),
  shortName: text('Short name', 2, 16),
  region: text('Region', 2, 80),
  contactEmail: z.string().trim().refine((v) => v === '' || z.email().safeParse(v).success, 'Enter a valid e-mail address.'),
  colourPrimary: colour,
  colourSecondary: colour,
});

export type ClubFormValues = z.infer<typeof clubFormSchema>;

export const CLUB_FORM_FIELDS = ['name', 'shortName', 'region', 'contactEmail', 'colourPrimary', 'colourSecondary'] as const;

/** A club's current details, or a blank form in the league's default colours for a new club. */
export function clubFormDefaults(club?: Pick<ClubDetail, 'name' | 'shortName' | 'region' | 'contactEmail' | 'colourPrimary' | 'colourSecondary'>): ClubFormValues {
  if (!club) return { name: '', shortName: '', region: '', contactEmail: '', colourPrimary: '#2f5d3a', colourSecondary: '#c9a66b' };
  return { name: club.name, shortName: club.shortName, region: club.region, contactEmail: club.contactEmail ?? '', colourPrimary: club.colourPrimary, colourSecondary: club.colourSecondary };
}

/** The form as the API's ClubInput: short names are capitals, an empty address is none. */
export function toClubInput(values: ClubFormValues) {
  return {
    name: values.name.trim(),
    shortName: values.shortName.trim().toUpperCase(),
    region: values.region.trim(),
    contactEmail: values.contactEmail.trim() === '' ? null : values.contactEmail.trim(),
    colourPrimary: values.colourPrimary.toLowerCase(),
    colourSecondary: values.colourSecondary.toLowerCase(),
  };
}
