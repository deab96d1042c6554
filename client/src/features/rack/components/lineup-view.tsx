import { useMutation, useQuery } from '@apollo/client/react';
import { DIVISION_LABELS } from '@endgrain/shared';
import Print from '@mui/icons-material/Print';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import GlobalStyles from '@mui/material/GlobalStyles';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { rackDocuments } from '../api/rack-documents.js';
import type { LineupEntry } from '../api/types.js';
import { AssignDialog } from './assign-dialog.js';
import { LineupOverrides } from './lineup-overrides.js';
import { RackCautions } from './rack-cautions.js';

// The printed sheet keeps the lineup and the cautions and drops the app's navigation and buttons.
const printStyles = (
  <GlobalStyles styles={{ '@media print': { 'header.MuiAppBar-root, nav[aria-label="Places"], [data-noprint]': { display: 'none !important' }, main: { margin: '0 !important', padding: '0 !important' } } }} />
);

export function LineupView({ meetId, clubId }: { meetId: string; clubId: string }) {
  const { data, loading, error } = useQuery(rackDocuments.lineup, { variables: { meetId, clubId } });
  const [editing, setEditing] = useState<LineupEntry | null>(null);
  const [warnings, setWarnings] = useState<string[] | null>(null);
  const [clear] = useMutation(rackDocuments.clearLineupAssignment, { refetchQueries: [rackDocuments.lineup], awaitRefetchQueries: true });

  if (loading && !data) return <PageLoading label="Loading the lineup" />;
  if (error || !data) {
    return (
      <Alert severity="error" role="alert">
        {graphQLErrorDetails(error)[0]?.message} <Link component={RouterLink} to={paths.rack.href(clubId)}>Back to the rack</Link>
      </Alert>
    );
  }
  const lineup = data.lineup;
  return (
    <Stack spacing={3}>
      {printStyles}
      <PageHeading lead={`${lineup.clubName} · ${lineup.meetDate} · ${lineup.venue}`}>{`Lineup: ${lineup.meetName}`}</PageHeading>
      <Stack direction="row" spacing={1} data-noprint>
        <Button variant="outlined" startIcon={<Print />} onClick={() => window.print()}>
          Print the lineup sheet
        </Button>
        <Button component={RouterLink} to={paths.meet.href(meetId)}>
          Meet page
        </Button>
      </Stack>
      <RackCautions screen="lineup" />
      {warnings && (
        <Alert severity={warnings.length ? 'warning' : 'success'} role="status" onClose={() => setWarnings(null)} data-noprint>
          {warnings.length ? warnings.map((w) => <div key={w}>{w}</div>) : 'Saved.'}
        </Alert>
      )}
      {lineup.entries.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>The club has no entries in this meet yet. Enter athletes on the meet page first.</Typography>
      ) : (
        <Table aria-label="Lineup" size="small">
          <TableHead>
            <TableRow>
              <TableCell>Event</TableCell>
              <TableCell>Heat</TableCell>
              <TableCell>Athlete</TableCell>
              <TableCell>Axe</TableCell>
              <TableCell>Check</TableCell>
              {lineup.canManage && <TableCell data-noprint />}
            </TableRow>
          </TableHead>
          <TableBody>
            {lineup.entries.map((entry) => (
              <TableRow key={entry.entryId}>
                <TableCell>
                  {entry.eventName} · {DIVISION_LABELS[entry.division]}
                </TableCell>
                <TableCell>{entry.heat ?? '—'}</TableCell>
                <TableCell>{entry.assignment?.athleteName ?? entry.athletes.map((a) => a.name).join(' & ')}</TableCell>
                <TableCell>{entry.assignment?.axeLabel ?? (entry.usesHead ? 'Not chosen' : 'No head')}</TableCell>
                <TableCell>
                  {entry.warnings.map((w) => (
                    // Signal orange marks the line; the words stay in body text colour for contrast.
                    <Typography key={w} variant="body2" sx={{ borderLeft: 4, borderColor: 'warning.main', pl: 1, mb: 0.5, fontWeight: 700 }}>
                      {w}
                    </Typography>
                  ))}
                </TableCell>
                {lineup.canManage && (
                  <TableCell data-noprint sx={{ whiteSpace: 'nowrap' }}>
                    <Button size="small" onClick={() => setEditing(entry)} aria-label={`Set lineup for ${entry.eventName}, ${entry.athletes.map((a) => a.name).join(' & ')}`}>
                      {entry.assignment ? 'Change' : 'Assign'}
                    </Button>
                    {entry.assignment && (
                      <Button size="small" color="error" onClick={() => void clear({ variables: { entryId: entry.entryId } })}>
                        Clear
                      </Button>
                    )}
                  </TableCell>
                )}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
      {lineup.canManage && <LineupOverrides meetId={meetId} clubId={clubId} />}
      {editing && (
        <AssignDialog
          clubId={clubId}
          entry={editing}
          onClose={() => setEditing(null)}
          onAssigned={(list) => {
            setEditing(null);
            setWarnings(list);
          }}
        />
      )}
    </Stack>
  );
}
