import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { useState } from 'react';

import { SectionCard } from '../../../components/ui/section-card.js';
import { resultsDocuments as docs } from '../api/results-documents.js';
import { describeAuditChange } from '../lib/describe-audit.js';
import { formatMoment } from '../../../lib/format-moment.js';

const PAGE = 20;
const ACTION_LABELS = { RECORDED: 'Posted', IMPORTED: 'Imported from a sheet', CORRECTED: 'Corrected' } as const;

/** For organisers: every change to this meet's results, newest first, with who, when, why and what changed. */
export function ResultsChangeLog({ meetId, labels }: { meetId: string; labels: ReadonlyMap<string, string> }) {
  const { data, loading, error } = useQuery(docs.resultAudit, { variables: { meetId }, fetchPolicy: 'cache-and-network' });
  const [correctionsOnly, setCorrectionsOnly] = useState(false);
  const [shown, setShown] = useState(PAGE);
  const all = data?.resultAudit ?? [];
  const entries = correctionsOnly ? all.filter((e) => e.action === 'CORRECTED') : all;
  return (
    <SectionCard title="Change log">
      <Stack spacing={1.5}>
        <Typography sx={{ color: 'text.secondary' }}>
          Every result posted, imported or corrected for this meet, with who made the change and when. Places and points are recomputed after each one.
        </Typography>
        <FormControlLabel control={<Switch checked={correctionsOnly} onChange={(e) => { setCorrectionsOnly(e.target.checked); setShown(PAGE); }} />} label="Corrections only" />
        {loading && !data && <Typography sx={{ color: 'text.secondary' }}>Loading the change log…</Typography>}
        {error && <Alert severity="error">{error.message}</Alert>}
        {data && entries.length === 0 && (
          <Typography>{correctionsOnly ? 'No corrections: every result stands as first posted.' : 'Nothing posted yet.'}</Typography>
        )}
        {entries.length > 0 && (
          <List dense disablePadding aria-label="Changes to these results">
            {entries.slice(0, shown).map((e) => (
              <ListItem key={e.id} disableGutters divider sx={{ alignItems: 'flex-start' }}>
                <ListItemText
                  primary={`${ACTION_LABELS[e.action] ?? e.action}: ${labels.get(e.entryId) ?? 'an entry since withdrawn'}`}
                  secondary={
                    <>
                      {`${formatMoment(e.at)} · ${e.byName ?? 'an account no longer on record'}${e.reason ? ` · reason: ${e.reason}` : ''}`}
                      <br />
                      {describeAuditChange(e.before, e.after)}
                    </>
                  }
                />
              </ListItem>
            ))}
          </List>
        )}
        {entries.length > shown && (
          <Button onClick={() => setShown((n) => n + PAGE)} sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
            Show {Math.min(PAGE, entries.length - shown)} more of {entries.length - shown}
          </Button>
        )}
      </Stack>
    </SectionCard>
  );
}
