import { depthPerSwing } from './depth-per-swing.js';
import type { TrialInput } from './trial-types.js';

export interface TesterEffect {
  axeId: string;
  axeLabel: string;
  /** Each tester's mean depth on this axe, deepest first. */
  byTester: { testerId: string; testerName: string; counted: number; meanMm: number }[];
  /** Deepest tester's mean ÷ shallowest tester's mean: 1 means the testers agree. */
  highToLowRatio: number;
}

/**
 * For every axe swung by two or more testers on the same block, how far the testers'
 * means differ: the same axe in different hands shows how much of a gap is the swing.
 */
export function testerEffect(trial: TrialInput): TesterEffect[] {
  const effects: TesterEffect[] = [];
  const axeIds = [...new Set(trial.runs.map((run) => run.axeId))];
  for (const axeId of axeIds) {
    const runs = trial.runs.filter((run) => run.axeId === axeId);
    const testerIds = [...new Set(runs.map((run) => run.testerId))];
    const byTester = testerIds.flatMap((testerId) => {
      const own = runs.filter((run) => run.testerId === testerId);
      const depth = depthPerSwing(own.flatMap((run) => run.swings));
      if (depth.meanMm === null) return [];
      const testerName = own[0]!.testerName ?? testerId;
      return [{ testerId, testerName, counted: depth.counted, meanMm: depth.meanMm }];
    });
    if (byTester.length < 2) continue;
    byTester.sort((a, b) => b.meanMm - a.meanMm || a.testerName.localeCompare(b.testerName, 'en'));
    const low = byTester[byTester.length - 1]!.meanMm;
    effects.push({
      axeId,
      axeLabel: runs[0]!.axeLabel,
      byTester,
      highToLowRatio: low > 0 ? byTester[0]!.meanMm / low : Number.POSITIVE_INFINITY,
    });
  }
  return effects;
}
