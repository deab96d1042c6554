import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useSearchParams } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { trialsDocuments } from '../api/trials-documents.js';
import type { UnitPreference } from '../api/types.js';
import { TrialCautions } from './trial-cautions.js';
import { TrialsList } from './trials-list.js';

export interface TrialsPlaceProps {
  /** The reader's clubs; an admin with none picks from every club. */
  clubs: { clubId: string; clubName: string }[];
  isAdmin: boolean;
  units: UnitPreference;
}

/** The Trials place: one club's trials at a time, the club kept in the address (?club=). */
export function TrialsPlace({ clubs, isAdmin, units }: TrialsPlaceProps) {
  const [params, setParams] = useSearchParams();
  const all = useQuery(trialsDocuments.clubs, { skip: !isAdmin });
  const options = isAdmin ? (all.data?.clubs.map((c) => ({ clubId: c.id, clubName: c.name })) ?? []) : clubs;
  if (isAdmin && all.loading && !all.data) return <PageLoading label="Loading clubs" />;
  if (options.length === 0) {
    return (
      <Alert severity="info">
        Trials belong to a club: its coaches record them and its athletes read them. Join a club through an invitation
        from its coach to see its trials.
      </Alert>
    );
  }
  const asked = params.get('club');
  const clubId = options.some((c) => c.clubId === asked) ? asked! : options[0]!.clubId;
  return (
    <Stack spacing={3}>
      {options.length > 1 && (
        <TextField
          select
          label="Club"
          value={clubId}
          onChange={(e) => setParams({ club: e.target.value }, { replace: true })}
          sx={{ maxWidth: 420 }}
        >
          {options.map((c) => (
            <MenuItem key={c.clubId} value={c.clubId}>
              {c.clubName}
            </MenuItem>
          ))}
        </TextField>
      )}
      <TrialsList key={clubId} clubId={clubId} units={units} />
      <TrialCautions />
    </Stack>
  );
}
