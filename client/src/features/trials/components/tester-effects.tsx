import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

import type { TrialTesterEffect, UnitPreference } from '../api/types.js';
import { formatDepth } from '../lib/depth-format.js';

/** The same axe in different hands: how much of a gap may be the swing, not the axe. */
export function TesterEffects({ effects, units }: { effects: TrialTesterEffect[]; units: UnitPreference }) {
  if (effects.length === 0) return null;
  return (
    <Stack spacing={1} component="section" aria-labelledby="tester-effect-heading">
      <Typography id="tester-effect-heading" variant="h2" sx={{ fontSize: '1.25rem' }}>
        Same axe, different testers
      </Typography>
      {effects.map((e) => (
        <Typography key={e.axeId} variant="body2">
          {e.axeLabel}: {e.byTester.map((t) => `${t.testerName} ${formatDepth(t.meanMm, units)} (${t.counted} swings)`).join(', ')}
          {e.highToLowRatio !== null && ` — the deepest tester cut ${e.highToLowRatio.toFixed(2)}× the shallowest.`}
        </Typography>
      ))}
    </Stack>
  );
}
