import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import Typography from '@mui/material/Typography';

import type { AxeService, UnitPreference } from '../api/types.js';
import { describeChange } from '../lib/describe-change.js';
import { SERVICE_LABELS } from '../lib/rack-labels.js';

/** The service log, newest first, with every setup change it made. */
export function ServiceHistory({ services, units, label }: { services: AxeService[]; units: UnitPreference; label: string }) {
  if (services.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>Nothing logged yet. Log each regrind, hone, rehang and inspection here.</Typography>;
  }
  return (
    <List aria-label={`Service history of ${label}`} disablePadding>
      {services.map((s) => (
        <ListItem key={s.id} divider disableGutters sx={{ display: 'block' }}>
          <Typography sx={{ fontWeight: 700 }}>
            {s.doneOn} · {SERVICE_LABELS[s.kind]} · {s.doneBy}
          </Typography>
          {s.notes && <Typography>{s.notes}</Typography>}
          {s.changes.map((change) => (
            <Typography key={change.field} variant="body2" sx={{ color: 'text.secondary' }}>
              {describeChange(change, units)}
            </Typography>
          ))}
        </ListItem>
      ))}
    </List>
  );
}
