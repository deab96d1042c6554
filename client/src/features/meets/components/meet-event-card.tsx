import { formatTime } from '@endgrain/shared';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

import type { Entry, MeetEvent, UnitPreference } from '../api/types.js';
import { eventTitle } from '../lib/event-title.js';
import { formatDiameter } from '../lib/format-diameter.js';
import type { MeetActions } from '../lib/meet-actions.js';
import { EventEntries } from './event-entries.js';

export interface MeetEventCardProps {
  event: MeetEvent;
  units: UnitPreference;
  actions: MeetActions;
  onEnter: (event: MeetEvent) => void;
  onEdit: (event: MeetEvent) => void;
  onRemove: (event: MeetEvent) => void;
  onDraw: (event: MeetEvent) => void;
  onWithdraw: (entry: Entry, event: MeetEvent) => void;
  ownClubIds: readonly string[];
}

function facts(event: MeetEvent, units: UnitPreference): string[] {
  const lines: string[] = [];
  if (event.speciesName || event.diameterMm !== null) {
    const diameter = event.diameterMm !== null ? `${formatDiameter(event.diameterMm, units)} ` : '';
    lines.push(`Block: ${diameter}${event.speciesName ?? 'species not set'}`);
  }
  if (event.timeLimitHundredths !== null) lines.push(`Time limit: ${formatTime(event.timeLimitHundredths)}`);
  if (event.weight !== 1) lines.push(`Counts ×${event.weight}`);
  if (event.scoringScheme === 'FIXED_TABLE' && event.pointsTable?.length) lines.push(`Own points table: ${event.pointsTable.join('-')}`);
  else if (event.scoringScheme === 'FIELD_SIZE') lines.push('Scored by field size');
  else if (event.scoringScheme === 'PERCENT_OF_BEST') lines.push('Scored as a percentage of the best');
  return lines;
}

export function MeetEventCard({ event, units, actions, onEnter, onEdit, onRemove, onDraw, onWithdraw, ownClubIds }: MeetEventCardProps) {
  const title = eventTitle(event);
  const team = event.eventType.teamSize;
  return (
    <Paper component="section" variant="outlined" aria-label={title} sx={{ p: { xs: 2, sm: 2.5 } }}>
      <Stack spacing={1.5}>
        <Box>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
            <Typography component="h3" variant="h3">
              {title}
            </Typography>
            {team > 1 && <Chip size="small" label={team === 2 ? (event.eventType.mixedPair ? 'Mixed pair' : 'Pair') : `Team of ${team}`} />}
          </Stack>
          {facts(event, units).map((line) => (
            <Typography key={line} variant="body2" sx={{ color: 'text.secondary' }}>
              {line}
            </Typography>
          ))}
          {event.notes && <Typography variant="body2">{event.notes}</Typography>}
        </Box>
        <EventEntries
          event={event}
          canWithdraw={actions.withdraw}
          onWithdraw={(entry) => onWithdraw(entry, event)}
          ownClubIds={ownClubIds}
          emptyHint={actions.enter ? 'Enter your athletes below.' : 'Clubs enter athletes while the meet takes entries.'}
        />
        {(actions.enter || actions.editEvents || actions.draw(event)) && (
          <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1, '& > *': { m: '0 !important' } }}>
            {actions.enter && (
              <Button variant="contained" onClick={() => onEnter(event)} aria-label={`Enter athletes in ${title}`}>
                Enter athletes
              </Button>
            )}
            {actions.draw(event) && (
              <Button variant="outlined" onClick={() => onDraw(event)} aria-label={`Draw the order for ${title}`}>
                Draw order
              </Button>
            )}
            {actions.editEvents && (
              <>
                <Button onClick={() => onEdit(event)} aria-label={`Edit ${title}`}>
                  Edit
                </Button>
                <Button color="error" onClick={() => onRemove(event)} aria-label={`Remove ${title}`}>
                  Remove
                </Button>
              </>
            )}
          </Stack>
        )}
      </Stack>
    </Paper>
  );
}
