import { describe, expect, it } from '@jest/globals';

import { seriousViolations } from './support/a11y';
import { api as callApi, demoToken } from './support/api';
import { signInThroughForm } from './support/accounts';
import { DESKTOP, PHONE, openSession, screenshot, useChromium } from './support/browser';

// Demo accounts come from the seed (seeds/src/demo-league.ts).
const ORGANISER = 'organiser@example.org';

const ADDRESS = `10.78.${process.pid % 250}.9`;
const api = <T>(query: string, variables: Record<string, unknown>, token?: string) => callApi<T>(query, variables, token, ADDRESS);
const token = (email: string) => demoToken(email, ADDRESS);

/** A closed meet with a men's underhand chop: two invented Larchmere athletes and one from Cedar Fork. */
async function closedMeet(stamp: string) {
  const [organiser, larch, cfork] = [await token(ORGANISER), await token('coach@example.org'), await token('coach.cedarfork@example.org')];
  const ids = await api<{ seasons: { id: string; isCurrent: boolean }[]; clubs: { id: string; shortName: string }[]; eventTypes: { id: string; code: string }[] }>(
    '{ seasons { id isCurrent } clubs { id shortName } eventTypes { id code } }', {});
  const club = (short: string) => ids.clubs.find((c) => c.shortName === short)!.id;
  const day = new Date(Date.now() + 7 * 86400_000).toISOString().slice(0, 10);
  const name = `Browser results ${stamp}`;
  const { createMeet } = await api<{ createMeet: { id: string } }>('mutation($i: MeetInput!) { createMeet(input: $i) { id } }', {
    i: {
      name, seasonId: ids.seasons.find((s) => s.isCurrent)!.id, hostClubId: club('LARCH'), startsOn: day, venue: 'Larchmere landing',
      entryDeadline: new Date(Date.now() + 3 * 86400_000).toISOString(), divisions: ['MENS'], scoringScheme: 'FIXED_TABLE', pointsTable: [7, 6, 5, 4, 3, 2, 1],
    },
  }, organiser);
  const meetId = createMeet.id;
  const { addMeetEvent } = await api<{ addMeetEvent: { id: string } }>('mutation($m: ID!, $i: MeetEventInput!) { addMeetEvent(meetId: $m, input: $i) { id } }', {
    m: meetId, i: { eventTypeId: ids.eventTypes.find((t) => t.code === 'underhand-chop')!.id, division: 'MENS', speciesId: 'eastern-white-pine', diameterMm: 304.8 },
  }, organiser);
  await api('mutation($id: ID!) { setMeetStatus(id: $id, status: OPEN) { status } }', { id: meetId }, organiser);
  const athletes: { name: string; club: string }[] = [];
  for (const [short, coach, lastName] of [['LARCH', larch, `Quillfeather${stamp}`], ['LARCH', larch, `Brackenridge${stamp}`], ['CFORK', cfork, `Mossgrove${stamp}`]] as const) {
    const { addAthlete } = await api<{ addAthlete: { id: string; name: string } }>('mutation($i: AthleteInput!) { addAthlete(input: $i) { id name } }', {
      i: { clubId: club(short), firstName: 'Tobin', lastName, divisions: ['MENS'], experience: 'EXPERIENCED' },
    }, coach);
    await api('mutation($i: EnterMeetEventInput!) { enterMeetEvent(input: $i) { id } }', { i: { meetEventId: addMeetEvent.id, clubId: club(short), athleteIds: [addAthlete.id] } }, coach);
    athletes.push({ name: addAthlete.name, club: short });
  }
  await api('mutation($id: ID!) { setMeetStatus(id: $id, status: CLOSED) { status } }', { id: meetId }, organiser);
  return { meetId, name, athletes };
}

const sheet = (athletes: { name: string; club: string }[], times: string[]) =>
  ['Event,Division,Club,Athletes,Time,Grind,Bevel angle,Condition', ...athletes.map((a, i) => `Underhand chop,Men's,${a.club},${a.name},${times[i]},convex,30,seasoned`)].join('\r\n');

describe('results in Chromium', () => {
  const browser = useChromium();

  it('an organiser uploads a sheet, sees its row errors, fixes it, saves, publishes; a visitor then reads the standings', async () => {
    const stamp = `${Date.now().toString(36)}${process.pid}`;
    const meet = await closedMeet(stamp);
    const { page, context, errors } = await openSession(browser(), DESKTOP);
    const violations: string[] = [];
    await signInThroughForm(page, ORGANISER);

    await page.goto(`/results/meets/${meet.meetId}/post`);
    await page.getByRole('heading', { name: `Post results: ${meet.name}` }).waitFor();
    const picker = page.locator('input[type="file"]');
    await picker.setInputFiles({ name: 'timekeepers.csv', mimeType: 'text/csv', buffer: Buffer.from(sheet(meet.athletes, ['41.37', '43.02', '1:5.3'])) });
    const problems = page.getByRole('table', { name: 'Problems in the sheet' });
    await problems.waitFor();
    // The header is row 1, so the third athlete is row 4.
    await expect(problems.getByRole('row').nth(1).textContent()).resolves.toContain('row 4, time: "1:5.3" is not m:ss.hh');
    violations.push(...(await seriousViolations(page)).map((v) => `upload errors: ${v}`));
    await screenshot(page, 'results-sheet-errors-desktop');

    await picker.setInputFiles({ name: 'timekeepers.csv', mimeType: 'text/csv', buffer: Buffer.from(sheet(meet.athletes, ['41.37', '43.02', '42.15'])) });
    await page.getByRole('table', { name: 'Rows in the sheet' }).waitFor();
    await page.getByRole('button', { name: 'Save 3 results' }).click();
    await page.getByText('Saved: 3 results added or changed, 0 already as in the sheet.').waitFor();
    await screenshot(page, 'results-sheet-saved-desktop');

    await page.getByRole('link', { name: 'See the results page' }).click();
    await page.getByRole('heading', { name: `Results: ${meet.name}` }).waitFor();
    await page.getByRole('button', { name: 'Publish results' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Publish results' }).click();
    await page.getByText(/^Results published\./).waitFor();
    const results = page.getByRole('table', { name: "Underhand chop · Men's results" });
    // Hand-worked on 7-6-5: 41.37 (Larchmere) 1st, 42.15 (Cedar Fork) 2nd, 43.02 (Larchmere) 3rd.
    await expect(results.getByRole('row').nth(1).textContent()).resolves.toMatch(new RegExp(`^1${meet.athletes[0]!.name}.*41\\.37.*7`));
    await context.close();

    const visitor = await openSession(browser(), PHONE);
    await visitor.page.goto('/standings');
    await visitor.page.getByRole('heading', { name: 'Standings' }).waitFor();
    await visitor.page.getByRole('table', { name: "Men's standings" }).waitFor();
    await visitor.page.getByText(/Tie-break\. Clubs level on season points are separated by the most event first places/).waitFor();
    await expect(visitor.page.getByRole('link', { name: meet.name }).count()).resolves.toBe(1);
    violations.push(...(await seriousViolations(visitor.page)).map((v) => `standings: ${v}`));
    await screenshot(visitor.page, 'results-standings-phone');
    await visitor.page.getByRole('link', { name: meet.name }).click();
    await visitor.page.getByRole('table', { name: "Underhand chop · Men's results" }).waitFor();
    violations.push(...(await seriousViolations(visitor.page)).map((v) => `meet results: ${v}`));

    expect(violations).toEqual([]);
    // The bad sheet's 422 answer is the expected refusal; Chromium logs every 4xx response anyway.
    const unexpected = errors.filter((e) => !e.includes('status of 422'));
    expect(errors.filter((e) => e.includes('status of 422'))).toHaveLength(1);
    expect([...unexpected, ...visitor.errors]).toEqual([]);
    await visitor.context.close();
  });
});
