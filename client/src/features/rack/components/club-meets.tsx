import { useQuery } from '@apollo/client/react';
import Link from '@mui/material/Link';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import { rackDocuments } from '../api/rack-documents.js';

/** The club's upcoming meets, each leading to its lineup (who swings which axe). */
export function ClubMeets({ clubId }: { clubId: string }) {
  const { data, loading } = useQuery(rackDocuments.clubMeets, { variables: { clubId } });
  if (loading && !data) return <Typography sx={{ color: 'text.secondary' }}>Loading meets…</Typography>;
  const meets = data?.meets ?? [];
  if (meets.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>No upcoming meets with this club's entries. Enter athletes in a meet first; its lineup then appears here.</Typography>;
  }
  return (
    <List aria-label="Upcoming meets" disablePadding>
      {meets.map((meet) => (
        <ListItem key={meet.id} disableGutters>
          <Link component={RouterLink} to={paths.rackLineup.href(meet.id, clubId)}>
            {meet.name}
          </Link>
          <Typography component="span" sx={{ color: 'text.secondary', ml: 1 }}>
            {meet.startsOn} · {meet.venue}
          </Typography>
        </ListItem>
      ))}
    </List>
  );
}
