import { describe, expect, it } from '@jest/globals';
import type { Page } from 'playwright-core';

import { seriousViolations } from './support/a11y';
import { signInThroughForm } from './support/accounts';
import { DESKTOP, PHONE, openSession, screenshot, useChromium } from './support/browser';

// Demo accounts and the Larchmere roster come from the seed (seeds/src/demo-league.ts).
const ORGANISER = 'organiser@example.org';
const COACH = 'coach@example.org';
const HOST = 'Larchmere College Woodsmen';

const isoDay = (daysAhead: number) => new Date(Date.now() + daysAhead * 86400_000).toISOString().slice(0, 10);

async function pick(page: Page, combobox: string, option: string): Promise<void> {
  await page.getByRole('combobox', { name: combobox }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
  await page.getByRole('listbox').waitFor({ state: 'detached' });
}

async function addEvent(page: Page, event: string, division: string, diameter?: { value: string; unit: 'inches' | 'millimetres' }) {
  await page.getByRole('button', { name: 'Add event' }).click();
  const dialog = page.getByRole('dialog', { name: 'Add an event' });
  await dialog.waitFor();
  await pick(page, 'Event', event);
  await pick(page, 'Division', division);
  await pick(page, 'Block species', 'Eastern white pine');
  if (diameter) {
    await dialog.getByRole('button', { name: diameter.unit }).click();
    await dialog.getByLabel('Block diameter (optional)').fill(diameter.value);
  }
  await dialog.getByRole('button', { name: 'Add event' }).click();
  await dialog.waitFor({ state: 'detached' });
}

describe('a meet is built, opened and entered in Chromium', () => {
  const browser = useChromium();

  it('an organiser builds a meet with two events, a coach enters athletes, and the meet page shows the entries', async () => {
    const name = `Browser Thaw Chop ${Date.now().toString(36)}`;
    const violations: string[] = [];

    // The organiser, on a laptop, builds the meet.
    const organiser = await openSession(browser(), DESKTOP);
    await signInThroughForm(organiser.page, ORGANISER);
    await organiser.page.goto('/meets');
    await organiser.page.getByRole('link', { name: 'New meet' }).first().click();
    await organiser.page.getByRole('heading', { name: 'New meet' }).waitFor();
    violations.push(...(await seriousViolations(organiser.page)).map((v) => `builder: ${v}`));
    await organiser.page.getByLabel('Meet name').fill(name);
    await pick(organiser.page, 'Host club', HOST);
    await organiser.page.getByLabel('Venue').fill('Larchmere sugar bush landing');
    await organiser.page.getByLabel('Meet date').fill(isoDay(40));
    await organiser.page.getByLabel('Entries close').fill(`${isoDay(35)}T18:00`);
    await organiser.page.getByRole('button', { name: 'Create meet' }).click();
    await organiser.page.getByRole('heading', { name, level: 1 }).waitFor();
    const meetUrl = organiser.page.url();

    // hand-worked: 12 in × 25.4 = 304.8 mm, printed to the millimetre for a metric reader
    await addEvent(organiser.page, 'Underhand chop', "Men's", { value: '12', unit: 'inches' });
    await addEvent(organiser.page, 'Double buck (pairs)', "Men's");
    const chop = organiser.page.getByRole('region', { name: "Underhand chop · Men's" });
    await expect(chop.getByText('Block: 305 mm eastern white pine').isVisible()).resolves.toBe(true);
    await organiser.page.getByRole('region', { name: "Double buck · Men's" }).waitFor();

    await organiser.page.getByRole('button', { name: 'Open for entries' }).click();
    const confirm = organiser.page.getByRole('dialog', { name: 'Open for entries?' });
    await confirm.getByRole('button', { name: 'Open for entries' }).click();
    await confirm.waitFor({ state: 'detached' });
    await organiser.page.getByText('Taking entries', { exact: true }).first().waitFor();
    violations.push(...(await seriousViolations(organiser.page)).map((v) => `meet (organiser): ${v}`));
    await screenshot(organiser.page, 'meets-built-desktop');

    // The coach, on a phone, enters one athlete in the chop and a pair in the double buck.
    const coach = await openSession(browser(), PHONE);
    await signInThroughForm(coach.page, COACH);
    await coach.page.goto(meetUrl);
    await coach.page.getByRole('heading', { name, level: 1 }).waitFor();

    await coach.page.getByRole('button', { name: "Enter athletes in Underhand chop · Men's" }).click();
    let picker = coach.page.getByRole('dialog', { name: "Enter athletes: Underhand chop · Men's" });
    await picker.getByRole('checkbox', { name: 'Anders Dunmere' }).check();
    await picker.getByRole('button', { name: 'Enter', exact: true }).click();
    await picker.getByRole('status').getByText('Entered: Anders Dunmere.').waitFor();
    violations.push(...(await seriousViolations(coach.page)).map((v) => `entry picker: ${v}`));
    await screenshot(coach.page, 'meets-entry-picker-phone');
    await picker.getByRole('button', { name: 'Done' }).click();

    await coach.page.getByRole('button', { name: "Enter athletes in Double buck · Men's" }).click();
    picker = coach.page.getByRole('dialog', { name: "Enter athletes: Double buck · Men's" });
    await picker.getByRole('checkbox', { name: 'Anders Dunmere' }).check();
    await picker.getByRole('checkbox', { name: 'Bram Juniperholm' }).check();
    await picker.getByRole('button', { name: 'Enter', exact: true }).click();
    await picker.getByRole('status').getByText('Entered: Anders Dunmere & Bram Juniperholm.').waitFor();
    await picker.getByRole('button', { name: 'Done' }).click();

    // Anyone reloading the meet page sees both entries with the club.
    await organiser.page.reload();
    const chopEntries = organiser.page.getByRole('list', { name: 'Entries in Underhand chop' });
    await chopEntries.getByText('Anders Dunmere', { exact: true }).waitFor();
    await expect(chopEntries.getByText('LARCH').isVisible()).resolves.toBe(true);
    await organiser.page.getByRole('list', { name: 'Entries in Double buck' }).getByText('Anders Dunmere & Bram Juniperholm').waitFor();
    await screenshot(organiser.page, 'meets-entered-desktop');
    await screenshot(coach.page, 'meets-entered-phone');

    expect(violations).toEqual([]);
    expect([...organiser.errors, ...coach.errors]).toEqual([]);
    await organiser.context.close();
    await coach.context.close();
  });
});
