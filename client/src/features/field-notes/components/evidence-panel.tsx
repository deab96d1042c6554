import GridOnIcon from '@mui/icons-material/GridOn';
import ScienceIcon from '@mui/icons-material/Science';
import TimerIcon from '@mui/icons-material/Timer';
import Link from '@mui/material/Link';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import type { EvidenceKind, EvidenceLink } from '../api/types.js';

const KIND: Record<EvidenceKind, { label: string; icon: typeof GridOnIcon }> = {
  TRIAL: { label: 'Trial', icon: ScienceIcon },
  RESULT: { label: 'Result', icon: TimerIcon },
  GRAIN_CELL: { label: 'Grain Map', icon: GridOnIcon },
};

/** What backs a finding, shown beside its text; each piece opens where it lives in the app. */
export function EvidencePanel({ evidence, isFinding }: { evidence: EvidenceLink[]; isFinding: boolean }) {
  if (evidence.length === 0 && !isFinding) return null;
  return (
    <Paper component="aside" variant="outlined" aria-labelledby="evidence-heading" sx={{ p: 2 }}>
      <Typography id="evidence-heading" variant="h2" sx={{ fontSize: '1.1rem', fontWeight: 700, mb: 1 }}>
        Evidence
      </Typography>
      {evidence.length === 0 ? (
        <Typography variant="body2" color="text.secondary">
          No trials, results or Grain Map cells are linked yet. Treat this finding as an opinion until they are.
        </Typography>
      ) : (
        <List dense disablePadding>
          {evidence.map((link, i) => {
            const { label, icon: Icon } = KIND[link.kind];
            return (
              <ListItem key={`${link.kind}-${link.refId ?? ''}-${i}`} disableGutters alignItems="flex-start">
                <ListItemIcon sx={{ minWidth: 36, mt: 0.5 }}>
                  <Icon fontSize="small" aria-hidden />
                </ListItemIcon>
                <ListItemText
                  primary={
                    <Link component={RouterLink} to={link.href} sx={{ fontWeight: 600, display: 'inline-block', minHeight: 24 }}>
                      {link.label}
                    </Link>
                  }
                  secondary={[label, link.summary].filter(Boolean).join(' · ')}
                />
              </ListItem>
            );
          })}
        </List>
      )}
    </Paper>
  );
}
