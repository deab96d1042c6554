import type { Page } from 'playwright-core';

export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? 'endgrain-demo-2026';

let counter = 0;
export function freshEmail(label: string): string {
  counter += 1;
  return `${label}.${Date.now().toString(36)}.${process.pid}.${counter}@example.org`;
}

/** Signs in through the real form and waits until the app shows the signed-in account menu. */
export async function signInThroughForm(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: /^Account menu for / }).waitFor();
}
