import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';

import type { AxeDetail, UnitPreference } from '../api/types.js';
import { GRIND_HINTS, GRIND_LABELS, USE_LABELS } from '../lib/rack-labels.js';
import { showLength, showMass } from '../lib/setup-units.js';

const angle = (deg: number | null) => (deg === null ? '—' : `${Math.round(deg * 100) / 100}°`);

/** The axe's current setup as a list of terms; both bevel angles are given and labelled. */
export function AxeSetup({ axe, units }: { axe: AxeDetail; units: UnitPreference }) {
  const g = axe.geometry;
  const rows: [string, string][] = [
    ['Grind', `${GRIND_LABELS[axe.grind]}: ${GRIND_HINTS[axe.grind]}`],
    ['Bevel, included angle', angle(g.includedAngleDeg)],
    ['Bevel, per side', angle(g.perSideAngleDeg)],
    ['Chisel width', showLength(g.chiselWidthMm, units, units === 'IMPERIAL' ? 3 : 2)],
    ['Thickness at the chisel shoulder', showLength(g.shoulderThicknessMm, units, units === 'IMPERIAL' ? 3 : 2)],
    ['Bit width', showLength(axe.bitWidthMm, units)],
    ['Head weight', showMass(axe.headWeightG, units)],
    ['Handle', [showLength(axe.handleLengthMm, units), axe.handleWood].filter((part) => part && part !== '—').join(', ') || '—'],
    ['Hang checked', axe.hangChecked ? 'Yes' : 'No'],
    ['Pinned', axe.pinned ? 'Yes' : 'No'],
    ['Who may use it', USE_LABELS[axe.allowedFor]],
    ['Seen by', axe.isPublic ? 'Everyone (public)' : "The club's members only"],
  ];
  return (
    <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: 'minmax(180px, max-content) 1fr' }, columnGap: 3, rowGap: 0.5, m: 0 }}>
      {rows.map(([term, value]) => (
        <Box key={term} sx={{ display: 'contents' }}>
          <Typography component="dt" sx={{ fontWeight: 700 }}>
            {term}
          </Typography>
          <Typography component="dd" sx={{ m: 0, mb: { xs: 1, sm: 0 } }}>
            {value}
          </Typography>
        </Box>
      ))}
    </Box>
  );
}
