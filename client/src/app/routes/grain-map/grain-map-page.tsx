import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { SafetyNote } from '../../../components/ui/safety-note.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { grainMapDocuments } from '../../../features/insights/api/grain-map-documents.js';
import { GrainMapView } from '../../../features/insights/components/grain-map-view.js';

export function GrainMapPage() {
  const { user } = useAuth();
  const options = useQuery(grainMapDocuments.options);
  return (
    <Stack spacing={2}>
      <PageHeading lead="Which head setup suits which wood: the league's own race times and trials, with how far each number can be trusted.">Grain Map</PageHeading>
      {options.loading && <PageLoading />}
      {options.error && <Alert severity="error">Could not load the events and seasons: {options.error.message}</Alert>}
      {options.data && <GrainMapView options={options.data} imperial={user?.unitSystem === 'IMPERIAL'} />}
      <SafetyNote>
        These are league statistics, not coaching. Change a grind or angle only with a qualified coach, sharpen with a guard and cut-resistant
        gloves, and follow the sanctioning body's rules for what may be used at a meet.
      </SafetyNote>
    </Stack>
  );
}
