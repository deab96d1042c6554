export const DIVISIONS = ['MENS', 'WOMENS', 'MIXED'] as const;
export type Division = (typeof DIVISIONS)[number];

export const DIVISION_LABELS: Record<Division, string> = { MENS: "Men's", WOMENS: "Women's", MIXED: 'Mixed' };

export const EXPERIENCE_LEVELS = ['ROOKIE', 'DEVELOPING', 'EXPERIENCED'] as const;
export type ExperienceLevel = (typeof EXPERIENCE_LEVELS)[number];

export const EXPERIENCE_LABELS: Record<ExperienceLevel, string> = {
  ROOKIE: 'Rookie',
  DEVELOPING: 'Developing',
  EXPERIENCED: 'Experienced',
};
