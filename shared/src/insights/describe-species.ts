import type { EvidenceLabel } from './evidence-label.js';
import type { GrainCell, GrainMatrix } from './grain-matrix.js';

export interface DescribeOptions {
  speciesId: string;
  /** Only cells of this condition, when the matrix was split by condition. */
  condition?: string;
  /** The wood as people say it, e.g. "green quaking aspen". */
  woodLabel: string;
  /** Display name of a grind id; defaults to the id itself. */
  grindLabel?: (grind: string) => string;
}

const LABEL_ORDER: Record<EvidenceLabel, number> = { strong: 0, suggestive: 1, 'not-enough-data': 2 };

/**
 * One plain sentence for a species from the matrix's own numbers: the cell with the best
 * evidence (then the largest effect). The wording never claims more than the label: a
 * difference is only "faster" or "slower" when the interval excludes no difference, and
 * a wood without enough data says so.
 */
export function describeSpecies(matrix: GrainMatrix, options: DescribeOptions): string {
  const cells = matrix.cells.filter(
    (cell) => cell.speciesId === options.speciesId && (options.condition === undefined || cell.condition === options.condition),
  );
  const usable = cells.filter((cell) => cell.effect !== null && cell.label !== 'not-enough-data').sort(byEvidence);
  const best = usable[0];
  if (best === undefined) {
    const results = cells.reduce((sum, cell) => sum + cell.results, 0);
    return `On ${options.woodLabel}, not enough data yet to compare head setups (${results} ${plural(results, 'result')} so far).`;
  }
  const effect = best.effect!;
  const percent = Math.round(Math.abs(1 - effect.median) * 100);
  const subject = subjectOf(best, options.grindLabel ?? ((grind) => grind));
  const counts = `n = ${effect.results} ${plural(effect.results, 'result')}, ${effect.athletes} ${plural(effect.athletes, 'athlete')}; ${best.label}`;
  let claim: string;
  if (!effect.excludesNoDifference) {
    claim = `showed no clear difference from the same athletes' usual times`;
  } else if (percent === 0) {
    claim = `ran within 1 % of the same athletes' usual times`;
  } else {
    claim = `ran ${percent} % ${effect.median < 1 ? 'faster' : 'slower'} than the same athletes' usual times`;
  }
  return `On ${options.woodLabel}, ${subject} ${claim} (${counts}).`;
}

function subjectOf(cell: GrainCell, grindLabel: (grind: string) => string): string {
  let subject = `${grindLabel(cell.grind)} grinds`;
  if (cell.bevelBand !== null) subject += cell.bevelBand.id === 'bevel-unrecorded' ? ' (angle not recorded)' : ` at ${cell.bevelBand.label}`;
  if (cell.chiselBand !== null) {
    subject += cell.chiselBand.id === 'chisel-unrecorded' ? ' (chisel not recorded)' : ` with a chisel of ${cell.chiselBand.label}`;
  }
  return subject;
}

function byEvidence(a: GrainCell, b: GrainCell): number {
  const label = LABEL_ORDER[a.label] - LABEL_ORDER[b.label];
  if (label !== 0) return label;
  const clear = Number(b.effect!.excludesNoDifference) - Number(a.effect!.excludesNoDifference);
  if (clear !== 0) return clear;
  const size = Math.abs(Math.log(b.effect!.median)) - Math.abs(Math.log(a.effect!.median));
  return size !== 0 ? size : a.key < b.key ? -1 : 1;
}

function plural(n: number, word: string): string {
  return n === 1 ? word : `${word}s`;
}
