/** The four account roles (DESIGN.md "Who uses it"); a signed-out visitor has none. */
export const ROLES = ['ADMIN', 'ORGANISER', 'COACH', 'ATHLETE'] as const;
export type Role = (typeof ROLES)[number];

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
