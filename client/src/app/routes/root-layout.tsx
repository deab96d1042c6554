import { Suspense } from 'react';
import { Outlet, ScrollRestoration } from 'react-router';

import { AppShell } from '../../components/layouts/app-shell.js';
import { PageLoading } from '../../components/ui/page-loading.js';
import { AccountMenu } from '../../features/auth/components/account-menu.js';
import { VerifyEmailBanner } from '../../features/auth/components/verify-email-banner.js';

export function RootLayout() {
  return (
    <AppShell accountMenu={<AccountMenu />} banner={<VerifyEmailBanner />}>
      <Suspense fallback={<PageLoading />}>
        <Outlet />
      </Suspense>
      <ScrollRestoration />
    </AppShell>
  );
}
