import { formatLength, RELEASE_SCALE, TRIAL_CAUTIONS } from '@endgrain/shared';

import type { TrialRankingRowModel } from './models/trial-ranking.model.js';
import type { TrialModel } from './models/trial.model.js';

export interface TrialFindingDraft {
  title: string;
  summary: string;
  bodyMarkdown: string;
  speciesId: string;
  condition: TrialModel['condition'];
  grinds: string[];
}

const GRIND_WORDS: Record<string, string> = { FLAT: 'flat', CONVEX: 'convex', CHISEL: 'chisel', COMPOUND: 'compound' };
const FLAG_WORDS: Record<string, string> = {
  BINDS: 'binds',
  PLACED_AFTER_RELEASING_AXES: 'placed after the axes that release',
  RELEASE_NOT_RECORDED: 'release not recorded',
  EDGE_DULL: 'dull edge',
  FEW_SWINGS: 'few swings',
  NO_COUNTED_SWINGS: 'no counted swings',
};

/** Millimetres first (stored SI), inches beside: a note is read in both unit systems. */
export function bothLengths(mm: number): string {
  return `${formatLength(mm, 'metric')} (${formatLength(mm, 'imperial')})`;
}

function headText(row: TrialRankingRowModel): string {
  if (!row.head) return '—';
  const parts = [GRIND_WORDS[row.head.grind] ?? row.head.grind];
  if (row.head.bevelIncludedDeg !== null) parts.push(`${row.head.bevelIncludedDeg}° included`);
  if (row.head.chiselWidthMm !== null) parts.push(`chisel ${bothLengths(row.head.chiselWidthMm)}`);
  return parts.join(', ');
}

function tableRow(row: TrialRankingRowModel): string {
  const depth = row.meanMm === null ? '—' : `${bothLengths(row.meanMm)} over ${row.counted} swing${row.counted === 1 ? '' : 's'}`;
  const ratio = row.isReference ? 'reference' : row.ratioToReference === null ? '—' : `${row.ratioToReference.toFixed(2)}×`;
  const release = row.releaseStep === null ? '—' : RELEASE_SCALE[row.releaseStep - 1]!.label;
  const flags = row.flags.map((f) => FLAG_WORDS[f] ?? f).join('; ');
  const cells = [row.verdictPlace ?? '—', row.axeLabel, headText(row), depth, ratio, release, flags || ' '];
  return `| ${cells.map((c) => String(c).replace(/\|/g, '/')).join(' | ')} |`;
}

/** The draft Field Note a published trial opens: the verdict as a table, the sentence, a link back. */
export function trialFinding(trial: TrialModel): TrialFindingDraft {
  const leader = trial.ranking.find((r) => r.verdictPlace === 1);
  const title = `Trial: ${trial.woodLabel}, ${trial.testedOn}`.slice(0, 140);
  const summary = (leader
    ? `${trial.clubName} tested ${trial.axeCount} axes on a ${bothLengths(trial.diameterMm)} ${trial.woodLabel} block; ${leader.axeLabel} came first.`
    : `${trial.clubName} tested axes on a ${bothLengths(trial.diameterMm)} ${trial.woodLabel} block.`
  ).slice(0, 300);
  const block = [
    `Block: ${bothLengths(trial.diameterMm)} ${trial.woodLabel}`,
    trial.knots && `knots: ${trial.knots}`,
    trial.faceUsed && `face used: ${trial.faceUsed}`,
    trial.airTempC !== null && `air ${trial.airTempC} °C`,
  ].filter(Boolean);
  const testers = trial.testers.map((t) => t.name).join(', ');
  const body = [
    `${block.join('; ')}. Tested on ${trial.testedOn} by ${testers}.`,
    '',
    '| Place | Axe | Head on the day | Depth a swing | Ratio to reference | Release | Flags |',
    '|---|---|---|---|---|---|---|',
    ...trial.ranking.map(tableRow),
    '',
    trial.recommendation,
    '',
    'Binding axes are placed after every axe that releases, whatever their depth; opening strokes are left out of every figure.',
    '',
    `[The trial in Endgrain](/trials/${trial.id})`,
    '',
    '## Safety',
    '',
    ...TRIAL_CAUTIONS.map((c) => `- ${c}`),
  ];
  const grinds = [...new Set(trial.ranking.flatMap((r) => (r.head ? [r.head.grind as string] : [])))].sort();
  return { title, summary, bodyMarkdown: body.join('\n'), speciesId: trial.speciesId, condition: trial.condition, grinds };
}
