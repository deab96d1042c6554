import { useMutation, useQuery } from '@apollo/client/react';
import Build from '@mui/icons-material/Build';
import Edit from '@mui/icons-material/Edit';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Snackbar from '@mui/material/Snackbar';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState, type ReactNode } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { rackDocuments } from '../api/rack-documents.js';
import type { UnitPreference } from '../api/types.js';
import { AxeFormDialog } from './axe-form-dialog.js';
import { AxePhotos } from './axe-photos.js';
import { AxeSetup } from './axe-setup.js';
import { AxeTrials } from './axe-trials.js';
import { AxeStatusChip } from './axe-status-chip.js';
import { RackCautions } from './rack-cautions.js';
import { SectionCard } from '../../../components/ui/section-card.js';
import { ServiceFormDialog } from './service-form-dialog.js';
import { ServiceHistory } from './service-history.js';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog.js';

export interface AxeViewProps {
  axeId: string;
  units: UnitPreference;
  /** Today's date (YYYY-MM-DD) for a new service entry; passed in so tests can pin it. */
  today: string;
  /** The results chopped with this axe, rendered by the results feature (features never import each other). */
  results?: ReactNode;
}

export function AxeView({ axeId, units, today, results }: AxeViewProps) {
  const { data, loading, error } = useQuery(rackDocuments.axe, { variables: { id: axeId } });
  const [dialog, setDialog] = useState<'edit' | 'service' | 'delete' | null>(null);
  const navigate = useNavigate();
  const [deleteAxe] = useMutation(rackDocuments.deleteAxe);
  const [notice, setNotice] = useState<string>();

  if (loading && !data) return <PageLoading label="Loading the axe" />;
  if (error || !data) {
    const notFound = graphQLErrorDetails(error).some((detail) => detail.code === 'NOT_FOUND');
    return (
      <Alert severity={notFound ? 'info' : 'error'} role="alert">
        {notFound ? "There is no such axe, or it belongs to another club's private rack. " : graphQLErrorDetails(error)[0]?.message}{' '}
        <Link component={RouterLink} to={paths.rack.href()}>Back to the rack</Link>
      </Alert>
    );
  }
  const axe = data.axe;
  return (
    <Stack spacing={3}>
      <div>
        <Link component={RouterLink} to={paths.rack.href(axe.clubId)}>
          {axe.clubName} rack
        </Link>
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <PageHeading lead={axe.maker || undefined}>{axe.label}</PageHeading>
          <AxeStatusChip status={axe.status} />
        </Stack>
      </div>
      {axe.canManage && (
        <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }}>
          <Button variant="contained" startIcon={<Build />} onClick={() => setDialog('service')}>
            Log a service
          </Button>
          <Button variant="outlined" startIcon={<Edit />} onClick={() => setDialog('edit')}>
            Edit axe
          </Button>
          <Button color="error" onClick={() => setDialog('delete')}>
            Delete
          </Button>
        </Stack>
      )}
      <RackCautions screen="rack" />
      <SectionCard title="Head and handle">
        <AxeSetup axe={axe} units={units} />
        {axe.notes && <Typography sx={{ mt: 2 }}>{axe.notes}</Typography>}
      </SectionCard>
      <SectionCard title="Photos">
        <AxePhotos axeId={axe.id} label={axe.label} photos={axe.photos} canManage={axe.canManage} />
      </SectionCard>
      <SectionCard title="Service history">
        <ServiceHistory services={axe.services} units={units} label={axe.label} />
      </SectionCard>
      <SectionCard title="Results with this axe">
        {results ?? <Typography sx={{ color: 'text.secondary' }}>Published results chopped with this axe are listed here.</Typography>}
      </SectionCard>
      <SectionCard title="Trials run with it">
        <AxeTrials axeId={axe.id} />
      </SectionCard>
      {dialog === 'edit' && (
        <AxeFormDialog clubId={axe.clubId} units={units} axe={axe} onClose={() => setDialog(null)} onSaved={() => { setDialog(null); setNotice(`${axe.label} saved.`); }} />
      )}
      {dialog === 'delete' && (
        <ConfirmDialog
          open
          title={`Delete ${axe.label}?`}
          confirmLabel="Delete axe"
          destructive
          onClose={() => setDialog(null)}
          onConfirm={async () => {
            await deleteAxe({ variables: { id: axe.id }, refetchQueries: [rackDocuments.rack] });
            void navigate(paths.rack.href(axe.clubId), { state: { notice: `${axe.label} deleted.` } });
          }}
        >
          For an axe added by mistake: it goes with its service log and photos, and cannot be brought back. An axe with results, trials or lineup
          places stays on record; set its status to retired instead.
        </ConfirmDialog>
      )}
      {dialog === 'service' && <ServiceFormDialog axe={axe} units={units} today={today} onClose={() => setDialog(null)} onSaved={setNotice} />}
      <Snackbar open={Boolean(notice)} autoHideDuration={6000} onClose={() => setNotice(undefined)} message={notice} sx={{ bottom: { xs: 'calc(80px + env(safe-area-inset-bottom))', sm: 24 } }} />
    </Stack>
  );
}
