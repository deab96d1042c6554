export const EVIDENCE_KINDS = ['TRIAL', 'RESULT', 'GRAIN_CELL'] as const;
export type EvidenceKind = (typeof EVIDENCE_KINDS)[number];

/** What backs a finding: a trial, a result, or a Grain Map cell (species × grind, optionally a condition). */
export interface EvidenceLink {
  kind: EvidenceKind;
  /** The trial or result id; null for a Grain Map cell. */
  refId: string | null;
  species: string | null;
  grind: string | null;
  condition: string | null;
  label: string;
  /** The numbers in a sentence, e.g. "9 results, 4 athletes, median 31.20 s". */
  summary: string;
}

function withQuery(path: string, params: Record<string, string | null | undefined>): string {
  // Hand-built: shared runs without DOM or Node types, so URLSearchParams is not available here.
  const text = Object.entries(params)
    .filter((entry): entry is [string, string] => Boolean(entry[1]))
    .map(([key, value]) => `${encodeURIComponent(key)}=${encodeURIComponent(value)}`)
    .join('&');
  return text ? `${path}?${text}` : path;
}

/** The Grain Map row for a species (and condition); with a grind, that cell opened (the page's "species~grind"). */
export function grainMapHref(cell: { species: string | null; condition?: string | null; grind?: string | null }): string {
  const open = cell.species && cell.grind ? `${cell.species}~${cell.grind}` : null;
  return withQuery('/grain-map', { species: cell.species, condition: cell.condition, cell: open });
}

/** Where a piece of evidence is shown in the app. */
export function evidenceHref(link: EvidenceLink): string {
  switch (link.kind) {
    case 'TRIAL':
      return `/trials/${encodeURIComponent(link.refId ?? '')}`;
    case 'RESULT':
      return withQuery('/results', { result: link.refId });
    case 'GRAIN_CELL':
      return grainMapHref(link);
    default: {
      const unreachable: never = link.kind;
      return unreachable;
    }
  }
}
