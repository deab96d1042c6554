import { ordinal } from './ordinal.js';
import type { TrialVerdictRow } from './trial-verdict.js';

/**
 * One plain paragraph from a verdict: places in order, each axe's depth per swing and its
 * ratio to the reference, then any binding move and tester caveat in words.
 * `woodLabel` is the block as people say it, e.g. "green quaking aspen".
 */
export function recommendationSentence(verdict: readonly TrialVerdictRow[], woodLabel: string): string {
  const placed = verdict.filter((row) => row.verdictPlace !== null);
  if (placed.length === 0) return `For ${woodLabel}: no counted swings yet, so no order.`;
  const groups = new Map<number, TrialVerdictRow[]>();
  for (const row of placed) groups.set(row.verdictPlace!, [...(groups.get(row.verdictPlace!) ?? []), row]);
  const parts = [...groups.entries()].map(([place, rows]) => {
    const prefix = rows.length > 1 ? `joint ${ordinal(place)}` : ordinal(place);
    return `${prefix} ${joinAnd(rows.map(describeAxe))}`;
  });
  const sentences = [`For ${woodLabel}: ${parts.join('; ')}.`];
  const moved = placed.filter((row) => row.flags.includes('placed-after-releasing-axes'));
  if (moved.length > 0) {
    const verb = moved.length > 1 ? 'cut deeper but bind' : 'cut deeper but binds';
    sentences.push(`${joinAnd(moved.map((row) => row.axeLabel))} ${verb}, so placed after the axes that release.`);
  }
  const testerCaveat = placed.filter((row) => row.testersWithoutReference.length > 0);
  if (testerCaveat.length > 0) {
    sentences.push(
      `${joinAnd(testerCaveat.map((row) => row.axeLabel))}: swung by someone who did not swing the reference axe; read the ratio with care.`,
    );
  }
  return sentences.join(' ');
}

function describeAxe(row: TrialVerdictRow): string {
  const depth = `${row.depth.meanMm!.toFixed(1)} mm a swing`;
  if (row.isReference) return `${row.axeLabel} (${depth}, reference)`;
  const ratio = row.ratioToReference === null ? 'no reference ratio' : `${row.ratioToReference.toFixed(2)}× the reference`;
  return `${row.axeLabel} (${depth}, ${ratio})`;
}

function joinAnd(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
