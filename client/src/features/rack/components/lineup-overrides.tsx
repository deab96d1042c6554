import { useQuery } from '@apollo/client/react';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import Typography from '@mui/material/Typography';

import { rackDocuments } from '../api/rack-documents.js';
import { SectionCard } from '../../../components/ui/section-card.js';

/** The record of every experience override given for this meet, newest first. */
export function LineupOverrides({ meetId, clubId }: { meetId: string; clubId: string }) {
  const { data } = useQuery(rackDocuments.lineupOverrides, { variables: { meetId, clubId }, fetchPolicy: 'cache-and-network' });
  const overrides = data?.lineupOverrides ?? [];
  return (
    <SectionCard title="Overrides on record">
      {overrides.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>No axe has been handed to an athlete below its experience rule for this meet.</Typography>
      ) : (
        <List disablePadding aria-label="Overrides on record">
          {overrides.map((o) => (
            <ListItem key={o.id} disableGutters divider sx={{ display: 'block' }}>
              <Typography sx={{ fontWeight: 700 }}>
                {o.axeLabel} to {o.athleteName}, by {o.byName} on {o.at.slice(0, 10)}
              </Typography>
              <Typography>{o.reason}</Typography>
            </ListItem>
          ))}
        </List>
      )}
    </SectionCard>
  );
}
