import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { AccountSummary } from '../../../features/auth/components/account-summary.js';
import { PreferencesForm } from '../../../features/auth/components/preferences-form.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Paper component="section" variant="outlined" sx={{ p: { xs: 2.5, sm: 4 } }} aria-label={title}>
      <Typography variant="h2" sx={{ mb: 2 }}>
        {title}
      </Typography>
      {children}
    </Paper>
  );
}

/** Always rendered behind <RequireAuth>, so a user is present. */
export function AccountPage() {
  const { user } = useAuth();
  if (!user) return null;
  return (
    <Stack spacing={3} sx={{ maxWidth: 840 }}>
      <PageHeading>Your account</PageHeading>
      <Section title="Details">
        <AccountSummary user={user} />
      </Section>
      <Section title="Preferences">
        <PreferencesForm key={user.id} user={user} />
      </Section>
    </Stack>
  );
}
