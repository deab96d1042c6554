import { mkdirSync } from 'node:fs';

import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { Browser } from 'playwright-core';

import { seriousViolations } from './support/a11y';
import { api as callApi, demoToken } from './support/api';
import { signInThroughForm } from './support/accounts';
import { BASE_URL, DESKTOP, PHONE, SHOT_DIR, launchBrowser, openSession, screenshot } from './support/browser';

// Demo accounts come from the seed (seeds/src/demo-league.ts).
const COACH = 'coach@example.org';
const ADMIN = 'admin@example.org';
const ATHLETE = 'athlete@example.org';
const NOTE = 'id slug title';

const ADDRESS = `10.78.${process.pid % 250}.7`;
const api = <T>(query: string, variables: Record<string, unknown>, token?: string) => callApi<T>(query, variables, token, ADDRESS);
const token = (email: string) => demoToken(email, ADDRESS);

/** A word no other note holds (letters only), so searches find this run's notes. */
const marker = (label: string) => `${label}${Date.now().toString(36).replace(/\d/g, (d) => 'qwertyuiop'[Number(d)]!)}`;

interface Tokens { coach: string; admin: string }
type NoteRef = { id: string; slug: string; title: string };

/** Written by the demo coach, published by the demo admin, as in the app. */
async function publishedNote(tokens: Tokens, input: Record<string, unknown>): Promise<NoteRef> {
  const note = (await api<{ createFieldNote: NoteRef }>(`mutation($i: FieldNoteInput!) { createFieldNote(input: $i) { ${NOTE} } }`, { i: { note: '', evidence: [], ...input } }, tokens.coach)).createFieldNote;
  await api(`mutation($id: ID!) { submitFieldNote(id: $id) { id } }`, { id: note.id }, tokens.coach);
  await api(`mutation($id: ID!) { publishFieldNote(id: $id, comment: "") { id } }`, { id: note.id }, tokens.admin);
  return note;
}

/** Waits until the search service has the note (the server indexes through its outbox). */
async function waitUntilSearchable(words: string, id: string): Promise<void> {
  const config = (await (await fetch(`${BASE_URL}/api/search/config`)).json()) as { url: string; searchKey: string; indexUid: string };
  for (let attempt = 0; attempt < 80; attempt += 1) {
    const res = await fetch(`${BASE_URL}${config.url}/indexes/${config.indexUid}/search`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${config.searchKey}` },
      body: JSON.stringify({ q: words }),
    });
    const body = (await res.json()) as { hits?: { id: string }[] };
    if (body.hits?.some((h) => h.id === `article-${id}`)) return;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`"${words}" never became searchable`);
}

const tags = (over: Record<string, string[]> = {}) => ({ species: [], grinds: [], events: [], conditions: [], free: [], ...over });

describe('Field Notes in Chromium', () => {
  let browser: Browser;
  let tokens: Tokens;
  let series: string[];
  const published: string[] = [];

  beforeAll(async () => {
    mkdirSync(SHOT_DIR, { recursive: true });
    browser = await launchBrowser();
    tokens = { coach: await token(COACH), admin: await token(ADMIN) };
    // The series is shared with every other test: remember it and put it back afterwards.
    series = (await api<{ firstCuts: { steps: { note: { id: string } }[] } }>('{ firstCuts { steps { note { id } } } }', {})).firstCuts.steps.map((s) => s.note.id);
  });
  afterAll(async () => {
    await api('mutation($ids: [ID!]!) { setFirstCuts(noteIds: $ids) { readCount } }', { ids: series }, tokens.admin);
    for (const id of published) await api('mutation($id: ID!) { unpublishFieldNote(id: $id, comment: "Browser test note, withdrawn.") { id } }', { id }, tokens.admin);
    await browser.close();
  });

  it('takes a newcomer through First Cuts, a guide, a search with a typo and a finding', async () => {
    const word = marker('larchmont');
    const guide = await publishedNote(tokens, {
      kind: 'GUIDE', title: `Your first swing, step by step ${word}`, summary: 'What a first practice looks like, from boots to the last swing.',
      bodyMarkdown: '# Before you start\n\n- Boots, shin guards and glasses\n- A clear zone of two axe lengths\n\nAsk your coach before every new step.', tags: tags({ free: ['first cuts'] }),
    });
    const finding = await publishedNote(tokens, {
      kind: 'FINDING', title: `Chisels on green aspen ${word}`, summary: 'Demo: chisel grinds kept their speed on wet aspen blocks.',
      bodyMarkdown: '**Demo finding.** Invented numbers.\n\n| grind | depth per swing |\n| --- | ---: |\n| chisel | 41 mm |',
      tags: tags({ species: ['quaking-aspen'], grinds: ['CHISEL'], conditions: ['GREEN'] }),
      evidence: [{ kind: 'GRAIN_CELL', species: 'quaking-aspen', grind: 'CHISEL', condition: 'GREEN', label: 'Green aspen × chisel', summary: 'demo: 14 results, 6 athletes' }],
    });
    published.push(guide.id, finding.id);
    await api('mutation($ids: [ID!]!) { setFirstCuts(noteIds: $ids) { readCount } }', { ids: [...series, guide.id] }, tokens.admin);
    await waitUntilSearchable(`poplar ${word}`, finding.id);

    const { page, context, errors } = await openSession(browser, PHONE);
    const violations: string[] = [];
    await signInThroughForm(page, ATHLETE);
    await page.goto('/first-cuts');
    await page.getByRole('heading', { name: 'First Cuts', level: 1 }).waitFor();
    violations.push(...(await seriousViolations(page)).map((v) => `first cuts: ${v}`));
    await screenshot(page, 'field-notes-first-cuts-phone');

    await page.getByRole('list', { name: 'First Cuts steps' }).getByRole('link', { name: new RegExp(guide.title) }).click();
    await page.getByRole('heading', { name: guide.title, level: 1 }).waitFor();
    await page.getByRole('heading', { name: 'Before you start' }).waitFor();
    await page.getByRole('button', { name: 'Mark as read' }).click();
    await page.getByRole('button', { name: 'Read — mark as unread' }).waitFor();
    violations.push(...(await seriousViolations(page)).map((v) => `guide: ${v}`));
    await screenshot(page, 'field-notes-guide-phone');

    // "poplr": one letter short; aspens are poplars, so the finding's species tag answers it.
    await page.getByRole('searchbox', { name: 'Search', exact: true }).fill(`poplr ${word}`);
    const hit = page.getByRole('article').filter({ hasText: finding.title }).first();
    await hit.waitFor();
    await expect(hit.locator('mark').count()).resolves.toBeGreaterThan(0);
    violations.push(...(await seriousViolations(page)).map((v) => `search: ${v}`));
    await screenshot(page, 'field-notes-search-phone');
    await hit.getByRole('link', { name: new RegExp(word) }).click();

    await page.getByRole('heading', { name: finding.title, level: 1 }).waitFor();
    const evidence = page.getByRole('complementary', { name: 'Evidence' });
    await expect(evidence.getByRole('link', { name: 'Green aspen × chisel' }).getAttribute('href')).resolves.toBe('/grain-map?species=quaking-aspen&condition=GREEN&cell=quaking-aspen~CHISEL');
    violations.push(...(await seriousViolations(page)).map((v) => `finding: ${v}`));
    await screenshot(page, 'field-notes-finding-phone');

    // Leave the demo athlete's progress as it was.
    await page.goto(`/field-notes/${guide.slug}`);
    await page.getByRole('button', { name: 'Read — mark as unread' }).click();
    await page.getByRole('button', { name: 'Mark as read' }).waitFor();
    expect(violations).toEqual([]);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('renders script tags, event handlers and javascript: links as inert text, in the note and in search', async () => {
    const word = marker('quillback');
    const body = [
      "<script>window.__pwned = 'script'</script>",
      '<img src=x onerror="window.__pwned = \'img\'">',
      "<svg onload=\"window.__pwned = 'svg'\"></svg>",
      "[tap here](javascript:window.__pwned='link')",
      '[mixed case](JaVaScRiPt:alert) [entity](&#106;avascript:alert) [data](data:text/html;base64,PHNjcmlwdD4=)',
      '<a href="javascript:window.__pwned=\'a\'">raw link</a>',
      '[a fine link](https://example.org/grain)',
    ].join('\n\n');
    const note = await publishedNote(tokens, {
      kind: 'GUIDE', title: `<img src=x onerror="window.__pwned='title'"> ${word}`, summary: 'A note written to try every trick on the renderer.', bodyMarkdown: body, tags: tags(),
    });
    published.push(note.id);
    await waitUntilSearchable(word, note.id);

    const { page, context } = await openSession(browser, DESKTOP);
    let dialogs = 0;
    page.on('dialog', (dialog) => {
      dialogs += 1;
      void dialog.dismiss();
    });
    await page.goto(`/field-notes/${note.slug}`);
    await page.getByText("<script>window.__pwned = 'script'</script>").waitFor();
    await page.getByText(/tap here/).click();
    const inert = () =>
      page.evaluate(() => ({
        pwned: (window as unknown as { __pwned?: string }).__pwned ?? null,
        scripts: document.querySelectorAll('.note-body script, .note-body svg, .note-body img').length,
        handlers: [...document.querySelectorAll('*')].filter((el) => [...el.attributes].some((a) => a.name.startsWith('on'))).length,
        scriptLinks: [...document.querySelectorAll('a[href]')].filter((a) => !/^(https?:|mailto:|\/|#)/i.test(a.getAttribute('href') ?? '') || /^\s*(javascript|data|vbscript):/i.test(a.getAttribute('href') ?? '')).length,
      }));
    await expect(inert()).resolves.toEqual({ pwned: null, scripts: 0, handlers: 0, scriptLinks: 0 });
    await expect(page.getByRole('link', { name: 'a fine link' }).getAttribute('href')).resolves.toBe('https://example.org/grain');
    await expect(page.getByRole('link', { name: 'tap here' }).count()).resolves.toBe(0);
    await screenshot(page, 'field-notes-inert-desktop');

    await page.goto(`/search?q=${word}`);
    await page.getByRole('article').first().waitFor();
    await expect(page.getByRole('article').first().textContent()).resolves.toContain('<img src=x onerror=');
    await expect(inert()).resolves.toEqual({ pwned: null, scripts: 0, handlers: 0, scriptLinks: 0 });
    expect(dialogs).toBe(0);
    await context.close();
  });
});
