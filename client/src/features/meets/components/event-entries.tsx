import PersonRemove from '@mui/icons-material/PersonRemove';
import Box from '@mui/material/Box';
import Chip from '@mui/material/Chip';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

import type { Entry, MeetEvent } from '../api/types.js';
import { orderOfCompetition } from '../lib/order-of-competition.js';

export interface EventEntriesProps {
  event: MeetEvent;
  canWithdraw: (entry: Entry) => boolean;
  onWithdraw: (entry: Entry) => void;
  /** The member's own clubs, whose entries stand out so a coach finds them at a glance. */
  ownClubIds: readonly string[];
  /** Said under an empty list: what to do next. */
  emptyHint: string;
}

function EntryRow({ entry, position, canWithdraw, onWithdraw, ownClubIds }: { entry: Entry; position?: number } & Omit<EventEntriesProps, 'event' | 'emptyHint'>) {
  const own = ownClubIds.includes(entry.clubId);
  return (
    <Box component="li" sx={{ display: 'flex', alignItems: 'center', gap: 1, minHeight: 44, py: 0.25 }}>
      {position !== undefined && (
        <Typography component="span" sx={{ width: 28, textAlign: 'right', fontWeight: 700, color: 'text.secondary' }} aria-label={`Position ${position}`}>
          {position}.
        </Typography>
      )}
      <Typography component="span" sx={{ flex: 1, minWidth: 0 }}>
        {entry.label}
      </Typography>
      <Chip label={entry.clubShortName} title={entry.clubName} size="small" variant={own ? 'filled' : 'outlined'} color={own ? 'primary' : 'default'} />
      {canWithdraw(entry) && (
        <IconButton aria-label={`Withdraw ${entry.label}`} onClick={() => onWithdraw(entry)} size="small">
          <PersonRemove fontSize="small" />
        </IconButton>
      )}
    </Box>
  );
}

const listSx = { listStyle: 'none', m: 0, p: 0 } as const;

/** The event's entries: in draw order by heat once drawn (with the seed to reproduce it), else by club. */
export function EventEntries({ event, canWithdraw, onWithdraw, ownClubIds, emptyHint }: EventEntriesProps) {
  const rowProps = { canWithdraw, onWithdraw, ownClubIds };
  if (event.entries.length === 0) {
    return (
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        No entries yet. {emptyHint}
      </Typography>
    );
  }
  const order = orderOfCompetition(event.entries);
  if (!order) {
    const byClub = [...event.entries].sort((a, b) => a.clubShortName.localeCompare(b.clubShortName) || a.label.localeCompare(b.label));
    return (
      <Box component="ul" sx={listSx} aria-label={`Entries in ${event.eventType.name}`}>
        {byClub.map((entry) => (
          <EntryRow key={entry.id} entry={entry} {...rowProps} />
        ))}
      </Box>
    );
  }
  return (
    <Stack spacing={1.5}>
      {order.heats.map((heat) => (
        <Box key={heat.heat}>
          <Typography component="h4" variant="body2" sx={{ fontWeight: 700 }}>
            Heat {heat.heat}
          </Typography>
          <Box component="ol" sx={listSx} aria-label={`Heat ${heat.heat} of ${event.eventType.name}`}>
            {heat.entries.map((entry) => (
              <EntryRow key={entry.id} entry={entry} position={entry.drawPosition!} {...rowProps} />
            ))}
          </Box>
        </Box>
      ))}
      {order.undrawn.length > 0 && (
        <Box>
          <Typography component="h4" variant="body2" sx={{ fontWeight: 700 }}>
            Entered after the draw (no place until the event is drawn again)
          </Typography>
          <Box component="ul" sx={listSx}>
            {order.undrawn.map((entry) => (
              <EntryRow key={entry.id} entry={entry} {...rowProps} />
            ))}
          </Box>
        </Box>
      )}
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        Drawn with seed {event.drawSeed}
        {event.heatSize ? `, heats of ${event.heatSize}` : ''}. Drawing again with the same seed and heat size gives the same
        order.
      </Typography>
    </Stack>
  );
}
