import { BLOCK_CONDITION_LABELS, formatTime, HEAD_GRIND_LABELS } from '@endgrain/shared';

/** The stored snapshot of a result in the audit log (JSON); only the fields a reader cares about. */
interface Snapshot {
  status?: string;
  finalStatus?: string;
  dqReason?: string | null;
  rawTimes?: number[];
  score?: number | null;
  penaltyHundredths?: number;
  axeLabel?: string | null;
  grind?: string | null;
  bevelIncludedDeg?: number | null;
  chiselWidthMm?: number | null;
  blockCondition?: string | null;
  place?: number | null;
  points?: number;
}

const STATUS = { FINISHED: 'finished', SCRATCH: 'scratch', DID_NOT_FINISH: 'did not finish', DISQUALIFIED: 'disqualified' } as Record<string, string>;

const none = '—';
const FIELDS: { label: string; show: (s: Snapshot) => string }[] = [
  { label: 'status', show: (s) => STATUS[s.finalStatus ?? s.status ?? ''] ?? none },
  { label: 'watches', show: (s) => (s.rawTimes?.length ? s.rawTimes.map(formatTime).join(' / ') : none) },
  { label: 'score', show: (s) => (s.score == null ? none : String(s.score)) },
  { label: 'penalty', show: (s) => (s.penaltyHundredths ? `+${formatTime(s.penaltyHundredths)}` : none) },
  { label: 'disqualified for', show: (s) => s.dqReason || none },
  { label: 'axe', show: (s) => s.axeLabel || none },
  { label: 'grind', show: (s) => (s.grind ? (HEAD_GRIND_LABELS[s.grind as keyof typeof HEAD_GRIND_LABELS] ?? s.grind) : none) },
  { label: 'bevel', show: (s) => (s.bevelIncludedDeg == null ? none : `${s.bevelIncludedDeg}° included`) },
  { label: 'chisel', show: (s) => (s.chiselWidthMm == null ? none : `${s.chiselWidthMm} mm`) },
  { label: 'block', show: (s) => (s.blockCondition ? (BLOCK_CONDITION_LABELS[s.blockCondition as keyof typeof BLOCK_CONDITION_LABELS] ?? s.blockCondition).toLowerCase() : none) },
  { label: 'place', show: (s) => (s.place == null ? none : String(s.place)) },
  { label: 'points', show: (s) => (s.points == null ? none : String(s.points)) },
];

function parse(json: string | null): Snapshot | null {
  if (json === null) return null;
  try {
    return JSON.parse(json) as Snapshot;
  } catch {
    return null;
  }
}

/**
 * One audit entry in words: what a first posting recorded, or what a change changed
 * ("watches 44.00 → 39.00; place 5 → 1; points 3 → 7"). Unrecorded values read "—".
 */
export function describeAuditChange(beforeJson: string | null, afterJson: string): string {
  const after = parse(afterJson);
  if (!after) return 'The change could not be read.';
  const before = parse(beforeJson);
  if (!before) {
    const parts = FIELDS.filter((f) => f.show(after) !== none && f.label !== 'status').map((f) => `${f.label} ${f.show(after)}`);
    return `Posted as ${FIELDS[0]!.show(after)}${parts.length ? `: ${parts.join('; ')}` : ''}`;
  }
  const changed = FIELDS.filter((f) => f.show(before) !== f.show(after)).map((f) => `${f.label} ${f.show(before)} → ${f.show(after)}`);
  return changed.length ? changed.join('; ') : 'Saved again with no change.';
}
