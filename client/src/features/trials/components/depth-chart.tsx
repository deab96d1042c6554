import Box from '@mui/material/Box';
import { useColorScheme } from '@mui/material/styles';
import Typography from '@mui/material/Typography';
import { LineChart } from '@mui/x-charts/LineChart';

import type { TrialRun, UnitPreference } from '../api/types.js';
import { depthValue } from '../lib/depth-format.js';

export interface DepthSeries {
  label: string;
  /** Counted swings in recorded order, in the reader's unit; null past the axe's last swing. */
  data: (number | null)[];
}

// Our own line colours: spruce, heartwood, lake blue, moss, plum, slate (lighter tints on the dark
// theme). No orange: that is kept for warnings.
const LINE_COLOURS = {
  light: ['#1f5c4a', '#7a4a2a', '#2f6d9e', '#6f7a2a', '#6b3f7a', '#4a5560'],
  dark: ['#7fc4a8', '#d9a27a', '#8cbde6', '#c2cc7a', '#c39ad1', '#b4bec8'],
};

/** One line per axe (all its testers' counted swings in order); opening strokes are left out as in every figure. */
export function depthSeries(runs: TrialRun[], units: UnitPreference): { swings: number[]; series: DepthSeries[] } {
  const byAxe = new Map<string, { label: string; depths: number[] }>();
  for (const run of runs) {
    const entry = byAxe.get(run.axeId) ?? { label: run.axeLabel, depths: [] };
    entry.depths.push(...run.swings.filter((s) => !s.opening).map((s) => depthValue(s.depthMm, units)));
    byAxe.set(run.axeId, entry);
  }
  const longest = Math.max(0, ...[...byAxe.values()].map((e) => e.depths.length));
  const swings = Array.from({ length: longest }, (_v, i) => i + 1);
  const series = [...byAxe.values()].map((e) => ({ label: e.label, data: swings.map((_s, i) => e.depths[i] ?? null) }));
  return { swings, series };
}

/** Depth per swing for each axe on the block. */
export function DepthChart({ runs, units }: { runs: TrialRun[]; units: UnitPreference }) {
  const { swings, series } = depthSeries(runs, units);
  const { mode, systemMode } = useColorScheme();
  // The theme switches schemes with CSS variables, so the scheme in use comes from useColorScheme.
  const colours = LINE_COLOURS[(mode === 'system' ? systemMode : mode) === 'dark' ? 'dark' : 'light'];
  const unit = units === 'IMPERIAL' ? 'in' : 'mm';
  if (swings.length === 0) return <Typography color="text.secondary">No counted swing yet, so there is nothing to draw.</Typography>;
  return (
    <Box role="figure" aria-label={`Depth of each counted swing, in ${unit === 'in' ? 'inches' : 'millimetres'}, one line per axe`}>
      <LineChart
        height={280}
        // Room for the numbers under the axis title: without it the chart shortens the tick labels to nothing.
        xAxis={[{ data: swings, scaleType: 'point', label: 'Counted swing', height: 52 }]}
        yAxis={[{ label: `Depth (${unit})`, min: 0 }]}
        series={series.map((s, i) => ({ ...s, color: colours[i % colours.length], curve: 'linear', valueFormatter: (v: number | null) => (v === null ? '' : `${v} ${unit}`) }))}
      />
    </Box>
  );
}
