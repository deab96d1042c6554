import { depthPerSwing, type DepthSummary } from './depth-per-swing.js';
import {
  EDGE_KEENNESS,
  releaseStep,
  type EdgeKeenness,
  type HeadSnapshot,
  type ReleaseId,
  type TrialInput,
  type TrialRun,
} from './trial-types.js';

export interface TrialAxeRow {
  axeId: string;
  axeLabel: string;
  isReference: boolean;
  head: HeadSnapshot | null;
  /** Display names of everyone who swung this axe on the block, sorted. */
  testers: string[];
  depth: DepthSummary;
  /** Mean depth ÷ the reference axe's mean depth, all testers pooled. */
  ratioToReference: number | null;
  /** The same ratio from only the testers who swung both axes; null when none did. */
  sameTesterRatio: number | null;
  /** Testers of this axe who did not swing the reference axe (their gap may be the swing). */
  testersWithoutReference: string[];
  /** Worst release recorded for the axe (a bit that bound once is treated as binding). */
  release: ReleaseId | null;
  /** Worst keenness recorded. */
  keenness: EdgeKeenness | null;
  notes: string[];
}

/** One row per axe on the block: depth per counted swing, ratio to the reference, caveats. */
export function summariseTrial(trial: TrialInput): TrialAxeRow[] {
  const byAxe = groupRuns(trial.runs);
  const referenceRuns = byAxe.get(trial.referenceAxeId) ?? [];
  const reference = depthPerSwing(referenceRuns.flatMap((run) => run.swings));
  const referenceTesters = new Set(referenceRuns.map((run) => run.testerId));
  return [...byAxe.entries()].map(([axeId, runs]) => {
    const isReference = axeId === trial.referenceAxeId;
    const depth = depthPerSwing(runs.flatMap((run) => run.swings));
    const notes: string[] = [];
    const strangers = isReference ? [] : runs.filter((run) => !referenceTesters.has(run.testerId));
    if (!isReference && referenceRuns.length === 0) {
      notes.push('The reference axe was not swung on this block, so no ratio is given.');
    } else if (strangers.length > 0) {
      notes.push(differentTesterNote(strangers, referenceRuns));
    }
    return {
      axeId,
      axeLabel: runs[0]!.axeLabel,
      isReference,
      head: runs.find((run) => run.head !== undefined)?.head ?? null,
      testers: uniqueSorted(runs.map(testerName)),
      depth,
      ratioToReference: ratio(depth.meanMm, reference.meanMm),
      sameTesterRatio: isReference ? 1 : sameTesterRatio(runs, referenceRuns),
      testersWithoutReference: referenceRuns.length === 0 ? [] : uniqueSorted(strangers.map(testerName)),
      release: worstRelease(runs),
      keenness: worstKeenness(runs),
      notes,
    };
  });
}

function groupRuns(runs: readonly TrialRun[]): Map<string, TrialRun[]> {
  const byAxe = new Map<string, TrialRun[]>();
  for (const run of runs) byAxe.set(run.axeId, [...(byAxe.get(run.axeId) ?? []), run]);
  return byAxe;
}

function ratio(numerator: number | null, denominator: number | null): number | null {
  if (numerator === null || denominator === null || denominator === 0) return null;
  return numerator / denominator;
}

function sameTesterRatio(runs: readonly TrialRun[], referenceRuns: readonly TrialRun[]): number | null {
  const shared = new Set(runs.map((run) => run.testerId).filter((id) => referenceRuns.some((r) => r.testerId === id)));
  if (shared.size === 0) return null;
  const pick = (list: readonly TrialRun[]) => depthPerSwing(list.filter((r) => shared.has(r.testerId)).flatMap((r) => r.swings));
  return ratio(pick(runs).meanMm, pick(referenceRuns).meanMm);
}

function differentTesterNote(strangers: readonly TrialRun[], referenceRuns: readonly TrialRun[]): string {
  const theirs = uniqueSorted(strangers.map(testerName)).join(' and ');
  const reference = uniqueSorted(referenceRuns.map(testerName)).join(' and ');
  return `Swung by ${theirs}, who did not swing the reference axe (${reference} did): part of the difference may be the tester, not the axe.`;
}

function testerName(run: TrialRun): string {
  return run.testerName ?? run.testerId;
}

function uniqueSorted(values: readonly string[]): string[] {
  return [...new Set(values)].sort((a, b) => a.localeCompare(b, 'en'));
}

function worstRelease(runs: readonly TrialRun[]): ReleaseId | null {
  const rated = runs.flatMap((run) => (run.release === null ? [] : [releaseStep(run.release)]));
  if (rated.length === 0) return null;
  return rated.reduce((worst, step) => (step.step < worst.step ? step : worst)).id;
}

function worstKeenness(runs: readonly TrialRun[]): EdgeKeenness | null {
  const rated = runs.flatMap((run) => (run.keenness === null ? [] : [EDGE_KEENNESS.indexOf(run.keenness)]));
  return rated.length === 0 ? null : EDGE_KEENNESS[Math.min(...rated)]!;
}
