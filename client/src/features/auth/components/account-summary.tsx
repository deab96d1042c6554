import Box from '@mui/material/Box';
import Chip from '@mui/material/Chip';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

import type { Role, User } from '../api/types.js';

const roleNames: Record<Role, string> = {
  ADMIN: 'League administrator',
  ORGANISER: 'Organiser',
  COACH: 'Coach',
  ATHLETE: 'Athlete',
};

function Row({ term, children }: { term: string; children: ReactNode }) {
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '10rem 1fr' }, gap: 0.5, py: 1.25 }}>
      <Typography component="dt" sx={{ color: 'text.secondary', fontWeight: 600 }}>
        {term}
      </Typography>
      <Box component="dd" sx={{ m: 0 }}>
        {children}
      </Box>
    </Box>
  );
}

export function AccountSummary({ user }: { user: User }) {
  return (
    <Box component="dl" sx={{ m: 0 }}>
      <Row term="Display name">{user.displayName}</Row>
      <Row term="E-mail">
        <Box sx={{ display: 'flex', gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
          <span>{user.email}</span>
          <Chip
            size="small"
            variant="outlined"
            color={user.emailVerified ? 'success' : 'default'}
            label={user.emailVerified ? 'Confirmed' : 'Not confirmed yet'}
          />
        </Box>
      </Row>
      <Row term="Role">{roleNames[user.role]}</Row>
      <Row term="Clubs">
        {user.clubs.length === 0 ? (
          <Typography>Not in a club yet. Your coach or league administrator can add you to your club.</Typography>
        ) : (
          <List dense disablePadding>
            {user.clubs.map((club) => (
              <ListItem key={club.clubId} disableGutters>
                <ListItemText primary={club.clubName} secondary={roleNames[club.role]} />
              </ListItem>
            ))}
          </List>
        )}
      </Row>
    </Box>
  );
}
