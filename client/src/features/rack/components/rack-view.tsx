import { useQuery } from '@apollo/client/react';
import Add from '@mui/icons-material/Add';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { rackDocuments } from '../api/rack-documents.js';
import type { UnitPreference } from '../api/types.js';
import { useRackFilter } from '../lib/use-rack-filter.js';
import { AxeFormDialog } from './axe-form-dialog.js';
import { ClubMeets } from './club-meets.js';
import { RackCautions } from './rack-cautions.js';
import { RackFilters } from './rack-filters.js';
import { RackGrid } from './rack-grid.js';
import { SectionCard } from '../../../components/ui/section-card.js';
import { NoticeToast } from '../../../components/ui/notice-toast.js';
import { useCarriedNotice } from '../../../lib/use-carried-notice.js';

export interface RackViewProps {
  /** The caller's clubs (memberships); the first is shown unless the address names another. */
  memberClubs: { id: string; name: string }[];
  /** Admins may open any club's rack. */
  anyClub: boolean;
  units: UnitPreference;
}

export function RackView({ memberClubs, anyClub, units }: RackViewProps) {
  const { filter, setFilter, variables, narrowed } = useRackFilter(memberClubs[0]?.id ?? '');
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  // "… deleted." from the axe page.
  const [notice, setNotice] = useCarriedNotice();
  const all = useQuery(rackDocuments.allClubs, { skip: !anyClub });
  const choices = anyClub ? (all.data?.clubs ?? []) : memberClubs;
  const { data, loading, error } = useQuery(rackDocuments.rack, { variables: { clubId: filter.clubId, filter: variables }, skip: !filter.clubId });

  const picker = choices.length > 1 && (
    <TextField select label="Club" value={choices.some((c) => c.id === filter.clubId) ? filter.clubId : ''} onChange={(event) => setFilter({ clubId: event.target.value })} sx={{ maxWidth: 360 }}>
      {choices.map((club) => (
        <MenuItem key={club.id} value={club.id}>
          {club.name}
        </MenuItem>
      ))}
    </TextField>
  );

  if (!filter.clubId) {
    return (
      <Stack spacing={3}>
        <PageHeading lead="A club's axes, their setup and service history.">Rack</PageHeading>
        {picker || <Alert severity="info">The rack belongs to a club. Ask your coach for an invitation to join yours; its rack then appears here.</Alert>}
      </Stack>
    );
  }
  const rack = data?.rack;
  return (
    <Stack spacing={3}>
      <PageHeading lead={rack ? `${rack.clubName}: the club's axes, their setup and service history.` : undefined}>Rack</PageHeading>
      {picker}
      <RackCautions screen="rack" />
      <SectionCard
        title="Axes"
        action={
          <Stack direction="row" spacing={1}>
            <Button component={RouterLink} to={paths.rackGeometry.href()}>
              Head geometry calculator
            </Button>
            {rack?.canManage && (
              <Button variant="contained" startIcon={<Add />} onClick={() => setAdding(true)}>
                Add axe
              </Button>
            )}
          </Stack>
        }
      >
        <Stack spacing={2}>
          <RackFilters filter={filter} onChange={setFilter} narrowed={narrowed} />
          {loading && !data ? (
            <PageLoading label="Loading the rack" />
          ) : error || !rack ? (
            <Alert severity="error" role="alert">
              {graphQLErrorDetails(error)[0]?.message}
            </Alert>
          ) : rack.axes.length === 0 ? (
            <Typography sx={{ color: 'text.secondary' }}>
              {narrowed ? (
                <>
                  No axes match these filters. <Link component="button" onClick={() => setFilter({ grind: '', status: '', use: '' })}>Clear filters</Link>
                </>
              ) : rack.canManage ? (
                'The rack is empty. Add your axes with their grind, bevel and handle, then log each service.'
              ) : (
                'No axes to show yet.'
              )}
            </Typography>
          ) : (
            <RackGrid axes={rack.axes} units={units} />
          )}
        </Stack>
      </SectionCard>
      {rack?.isMember && (
        <SectionCard title="Lineups">
          <ClubMeets clubId={filter.clubId} />
        </SectionCard>
      )}
      {adding && rack && (
        <AxeFormDialog clubId={rack.clubId} units={units} onClose={() => setAdding(false)} onSaved={(axe) => void navigate(paths.rackAxe.href(axe.id))} />
      )}
      <NoticeToast message={notice} onClose={() => setNotice(undefined)} />
    </Stack>
  );
}
