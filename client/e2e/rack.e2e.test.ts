import { deflateSync, crc32 } from 'node:zlib';

import { describe, expect, it } from '@jest/globals';

import { seriousViolations } from './support/a11y';
import { api as callApi, demoToken } from './support/api';
import { signInThroughForm } from './support/accounts';
import { DESKTOP, openSession, screenshot, useChromium } from './support/browser';

// Demo accounts come from the seed (seeds/src/demo-league.ts).
const COACH = 'coach@example.org';
const ORGANISER = 'organiser@example.org';

const ADDRESS = `10.77.${process.pid % 250}.9`;
const api = <T>(query: string, variables: Record<string, unknown>, token?: string) => callApi<T>(query, variables, token, ADDRESS);
const token = (email: string) => demoToken(email, ADDRESS);

/** A small, real PNG (one colour), so the browser can show it after the upload. */
function png(width: number, height: number): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const head = Buffer.alloc(8);
    head.writeUInt32BE(data.length, 0);
    head.write(type, 4, 'latin1');
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
    return Buffer.concat([head, data, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  const row = Buffer.concat([Buffer.from([0]), Buffer.alloc(width * 3, 0x8a)]);
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', ihdr), chunk('IDAT', deflateSync(Buffer.concat(Array.from({ length: height }, () => row)))), chunk('IEND', Buffer.alloc(0))]);
}

/** A meet a week out with an underhand chop that a new rookie of the coach's club is entered in. */
async function meetWithRookie(label: string) {
  const [organiser, coach] = [await token(ORGANISER), await token(COACH)];
  const ids = await api<{ seasons: { id: string; isCurrent: boolean }[]; clubs: { id: string; shortName: string }[]; eventTypes: { id: string; code: string }[] }>(
    '{ seasons { id isCurrent } clubs { id shortName } eventTypes { id code } }',
    {},
  );
  const clubId = ids.clubs.find((c) => c.shortName === 'LARCH')!.id;
  const day = new Date(Date.now() + 7 * 86400_000).toISOString().slice(0, 10);
  const meet = await api<{ createMeet: { id: string } }>('mutation($i: MeetInput!) { createMeet(input: $i) { id } }', {
    i: {
      name: `Rack lineup ${label}`, seasonId: ids.seasons.find((s) => s.isCurrent)!.id, hostClubId: clubId, startsOn: day, venue: 'Larchmere landing',
      entryDeadline: new Date(Date.now() + 3 * 86400_000).toISOString(), divisions: ['MENS'], scoringScheme: 'FIXED_TABLE', pointsTable: [7, 6, 5, 4, 3, 2, 1],
    },
  }, organiser);
  const meetId = meet.createMeet.id;
  const chop = await api<{ addMeetEvent: { id: string } }>('mutation($m: ID!, $i: MeetEventInput!) { addMeetEvent(meetId: $m, input: $i) { id } }', {
    m: meetId, i: { eventTypeId: ids.eventTypes.find((t) => t.code === 'underhand-chop')!.id, division: 'MENS', speciesId: 'eastern-white-pine', diameterMm: 304.8 },
  }, organiser);
  await api('mutation($id: ID!) { setMeetStatus(id: $id, status: OPEN) { status } }', { id: meetId }, organiser);
  const rookie = await api<{ addAthlete: { id: string; name: string } }>('mutation($i: AthleteInput!) { addAthlete(input: $i) { id name } }', {
    i: { clubId, firstName: 'Corin', lastName: `Ashby${label}`, divisions: ['MENS'], experience: 'ROOKIE' },
  }, coach);
  await api('mutation($i: EnterMeetEventInput!) { enterMeetEvent(input: $i) { id } }', { i: { meetEventId: chop.addMeetEvent.id, clubId, athleteIds: [rookie.addAthlete.id] } }, coach);
  return { meetId, clubId, rookie: rookie.addAthlete.name };
}

describe('the rack in Chromium', () => {
  const browser = useChromium();

  it('a coach adds an axe with a photo, logs a regrind, assigns it in a lineup and sees the warning for a rookie', async () => {
    const label = Date.now().toString(36).slice(-6);
    const axeLabel = `Race ${label}`;
    const { meetId, clubId, rookie } = await meetWithRookie(label);
    const violations: string[] = [];
    const coach = await openSession(browser(), DESKTOP);
    const { page } = coach;
    page.setDefaultTimeout(15_000);
    await signInThroughForm(page, COACH);

    await page.goto('/rack');
    await page.getByRole('heading', { name: 'Rack', level: 1 }).waitFor();
    await page.getByRole('note').getByText('Safety with the rack').waitFor();
    violations.push(...(await seriousViolations(page)).map((v) => `rack: ${v}`));
    await page.getByRole('button', { name: 'Add axe' }).click();
    const form = page.getByRole('dialog', { name: 'Add an axe' });
    await form.getByRole('button', { name: 'mm and kg' }).click();
    await form.getByLabel('Label').fill(axeLabel);
    await form.getByLabel('Maker (optional)').fill('Hollowbrook Forge');
    await form.getByRole('combobox', { name: 'Grind' }).click();
    await page.getByRole('option', { name: 'Chisel', exact: true }).click();
    await form.getByLabel('Bevel, included angle (optional)').fill('15');
    await form.getByText('Across both faces; 7.5° per side').waitFor();
    await form.getByLabel('Chisel width (optional)').fill('19.05');
    await form.getByRole('combobox', { name: 'Who may use it' }).click();
    await page.getByRole('option', { name: 'Experienced only' }).click();
    await form.getByRole('button', { name: 'Add axe' }).click();
    await page.getByRole('heading', { name: axeLabel, level: 1 }).waitFor();
    violations.push(...(await seriousViolations(page)).map((v) => `axe: ${v}`));

    // hand-worked: 2 × 19.05 mm × tan 7.5° = 5.016 mm at the chisel shoulder
    const setup = page.getByRole('region', { name: 'Head and handle' });
    await setup.getByText('5.02 mm').waitFor();
    await page.getByLabel('Caption (optional)').fill('Left cheek');
    await page.getByLabel('Photo file').setInputFiles({ name: 'cheek.png', mimeType: 'image/png', buffer: png(64, 40) });
    const photo = page.getByRole('img', { name: 'Left cheek' });
    await photo.waitFor();
    await expect(photo.evaluate((img: HTMLImageElement) => img.decode().then(() => img.naturalWidth))).resolves.toBe(64);

    await page.getByRole('button', { name: 'Log a service' }).click();
    const service = page.getByRole('dialog', { name: `Log a service: ${axeLabel}` });
    await service.getByRole('note').getByText('Safety at the grinder and the bench').waitFor();
    await service.getByLabel('New bevel, included angle').fill('16');
    await service.getByRole('button', { name: 'Log service' }).click();
    await service.waitFor({ state: 'detached' });
    await page.getByRole('list', { name: `Service history of ${axeLabel}` }).getByText('Bevel: 15° included (7.5° per side) → 16° included (8° per side)').waitFor();
    await screenshot(page, 'rack-axe-desktop');

    await page.goto(`/rack/lineups/${meetId}?club=${clubId}`);
    await page.getByRole('note').getByText('Safety before handing out axes').waitFor();
    await page.getByRole('button', { name: `Set lineup for Underhand chop, ${rookie}` }).click();
    const assign = page.getByRole('dialog', { name: 'Lineup: Underhand chop' });
    await assign.getByRole('combobox', { name: 'Axe' }).click();
    await page.getByRole('option', { name: `${axeLabel} · Ready · Experienced only` }).click();
    await assign.getByLabel('Reason for the override').fill('Coached on this axe under supervision all autumn');
    await assign.getByRole('button', { name: 'Save' }).click();
    await assign.waitFor({ state: 'detached' });
    await page.getByRole('status').getByText(`${axeLabel} is for experienced athletes only; ${rookie} is a rookie.`, { exact: false }).waitFor();
    await page.getByRole('list', { name: 'Overrides on record' }).getByText('Coached on this axe under supervision all autumn').waitFor();
    violations.push(...(await seriousViolations(page)).map((v) => `lineup: ${v}`));
    await screenshot(page, 'rack-lineup-desktop');

    expect(violations).toEqual([]);
    expect(coach.errors).toEqual([]);
    await coach.context.close();
  });
});
