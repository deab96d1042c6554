import { describe, expect, it } from '@jest/globals';
import type { Page } from 'playwright-core';

import { seriousViolations } from './support/a11y';
import { signInThroughForm } from './support/accounts';
import { DESKTOP, PHONE, openSession, screenshot, settled, useChromium } from './support/browser';

// The Larchmere coach comes from the seed (seeds/src/demo-league.ts); the past seasons of men's
// underhand results on quaking aspen come from the seed step's seedHistory (server/src/insights/seed-history.ts).
const COACH = 'coach@example.org';

async function pick(page: Page, combobox: string, option: string | RegExp): Promise<void> {
  await page.getByRole('combobox', { name: combobox }).click();
  await page.getByRole('option', { name: option }).click();
  await page.getByRole('listbox').waitFor({ state: 'detached' });
}

/** Signs in, opens the map, keeps only aspen and opens its chisel cell; returns the dialog. */
async function openAspenChisel(page: Page, shot: string, violations: string[]) {
  await signInThroughForm(page, COACH);
  await page.goto('/grain-map');
  await page.getByRole('heading', { name: 'Grain Map', level: 1 }).waitFor();
  const table = page.getByRole('table', { name: 'Species by grind' });
  await table.waitFor();
  await pick(page, 'Species', 'Quaking aspen');
  await page.waitForURL(/species=quaking-aspen/);
  // The address changes first; the map re-renders just after it.
  await expect(settled(() => table.getByRole('rowheader').allTextContents(), ['Quaking aspen'])).resolves.toEqual(['Quaking aspen']);
  violations.push(...(await seriousViolations(page)).map((v) => `${shot} map: ${v}`));
  await screenshot(page, `${shot}-map`);

  // n is printed in the cell; the dialog must list that many results behind it.
  const cell = table.getByRole('button', { name: /^Quaking aspen, chisel/i });
  const n = Number(/n = (\d+)/.exec((await cell.getAttribute('aria-label')) ?? '')?.[1]);
  expect(n).toBeGreaterThan(0);
  await cell.click();
  const dialog = page.getByRole('dialog', { name: /Quaking aspen, chisel grind/i });
  await dialog.getByRole('heading', { name: 'Results behind this cell' }).waitFor();
  await dialog.getByRole('grid').first().getByRole('row').nth(1).waitFor();
  await expect(dialog.getByText(new RegExp(`Race times: ${n} results from \\d+ athletes`)).isVisible()).resolves.toBe(true);
  // The open cell lives in the address, so the link can be shared.
  expect(decodeURIComponent(page.url())).toMatch(/cell=quaking-aspen~chisel/i);
  violations.push(...(await seriousViolations(page)).map((v) => `${shot} cell: ${v}`));
  await screenshot(page, `${shot}-cell`);
  return { dialog, n };
}

describe('a coach reads the Grain Map in Chromium', () => {
  const browser = useChromium();

  it('filters to one species on a phone, opens a cell and sees the results behind it', async () => {
    const { page, context, errors } = await openSession(browser(), PHONE);
    const violations: string[] = [];
    const { dialog } = await openAspenChisel(page, 'grain-map-phone', violations);
    // The athlete's time comes right after the name so it fits on a phone; times print as (m:)ss.hh.
    const firstRow = dialog.getByRole('grid').first().getByRole('row').nth(1);
    await expect(firstRow.getByRole('gridcell').nth(1).textContent()).resolves.toMatch(/^(\d+:)?\d\d\.\d\d$/);
    await dialog.getByRole('button', { name: 'Close' }).click();
    await dialog.waitFor({ state: 'detached' });
    expect(page.url()).not.toContain('cell=');
    expect(violations).toEqual([]);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('shows the same cell on a desktop with every result listed', async () => {
    const { page, context, errors } = await openSession(browser(), DESKTOP);
    const violations: string[] = [];
    const { dialog, n } = await openAspenChisel(page, 'grain-map-desktop', violations);
    // The seed's aspen results all come from its invented "Aspen Days" season.
    await expect(dialog.getByRole('grid').first().getByRole('row').nth(1).textContent()).resolves.toContain('Aspen Days');
    // The grid footer counts the rows it holds ("1–25 of N").
    await expect(dialog.getByText(new RegExp(`of ${n}\\b`)).first().isVisible()).resolves.toBe(true);
    expect(violations).toEqual([]);
    expect(errors).toEqual([]);
    await context.close();
  });
});
