import { TRIAL_CAUTIONS } from '@endgrain/shared';
import Box from '@mui/material/Box';

import { SafetyNote } from '../../../components/ui/safety-note.js';

/** The usual cautions beside every trial screen. */
export function TrialCautions() {
  return (
    <SafetyNote title="Before anyone swings">
      <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
        {TRIAL_CAUTIONS.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </Box>
    </SafetyNote>
  );
}
