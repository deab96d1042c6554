import Stack from '@mui/material/Stack';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { SafetyNote } from '../../../components/ui/safety-note.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { GeometryCalculator } from '../../../features/rack/components/geometry-calculator.js';

export function GeometryPage() {
  const { user } = useAuth();
  return (
    <Stack spacing={3}>
      <PageHeading lead="Bevel angle, chisel width and edge thickness by trigonometry, with the included and per-side angles both given.">Head geometry</PageHeading>
      <GeometryCalculator units={user?.unitSystem ?? 'METRIC'} />
      <SafetyNote title="Safety at the grinder">
        Regrind only with eye protection, gloves and a guarded, water-cooled wheel, and with a qualified coach when
        changing a competition bevel. The sanctioning body&apos;s rules on heads and local law come first.
      </SafetyNote>
    </Stack>
  );
}
