import Typography from '@mui/material/Typography';
import Stack from '@mui/material/Stack';

import type { GrainSettings } from '../api/types.js';

/** How the numbers are made, in plain words, with the thresholds the labels use. */
export function MethodNote({ settings }: { settings: GrainSettings }) {
  const s = settings;
  return (
    <Stack spacing={1} component="section" aria-labelledby="grain-method">
      <Typography id="grain-method" variant="h6" component="h2">How these numbers are made</Typography>
      <Typography variant="body2">
        Every finished time is first rescaled to a {s.referenceMm} mm block: time × ({s.referenceMm} ÷ diameter)
        <sup>{s.exponent.toFixed(2)}</sup> ({s.exponentSource === 'fitted' ? 'exponent fitted from the league’s own results' : 'by cross-section area'}). {s.exponentNote}
      </Typography>
      <Typography variant="body2">
        Then each time is divided by the same athlete’s median time in this event on this wood, so a strong athlete does not make their grind
        look good. A cell’s effect is the median of those ratios: 0.96 means 4 % faster than those athletes usually are. The range around it is a
        {' '}{Math.round(s.level * 100)} % bootstrap interval ({s.resamples} resamples, fixed seed {s.seed}).
      </Typography>
      <Typography variant="body2">
        Labels: fewer than {s.minResults} results or {s.minAthletes} athletes is “not enough data” and nothing is claimed. “Strong” needs at
        least {s.strongMinResults} results from {s.strongMinAthletes} athletes and an interval that excludes no difference. Everything else is
        “suggestive”: a lead worth testing, not a finding. Grinds on one wood are compared with rank tests (p below {s.strongMaxP} for strong,
        {' '}{s.clearMaxP} for a clear difference, after adjusting for the number of pairs).
      </Typography>
      <Typography variant="body2">
        Trials are a separate kind of evidence: depth per swing against a club’s reference axe on the same block. They are shown beside race
        times, never mixed into them.
      </Typography>
    </Stack>
  );
}
