import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';

import type { MeetScoring } from '../api/types.js';
import { describeScoring } from '../lib/describe-scoring.js';

export function MeetScoringSummary({ meet }: { meet: MeetScoring }) {
  return (
    <Paper component="section" variant="outlined" aria-labelledby="meet-scoring" sx={{ p: { xs: 2, sm: 3 } }}>
      <Typography id="meet-scoring" variant="h3" component="h2" sx={{ mb: 1 }}>
        How this meet is scored
      </Typography>
      <Typography component="ul" sx={{ m: 0, pl: 2.5 }}>
        {describeScoring(meet).map((line) => (
          <li key={line}>{line}</li>
        ))}
      </Typography>
    </Paper>
  );
}
