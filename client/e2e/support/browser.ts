import { mkdirSync } from 'node:fs';

import { afterAll, beforeAll } from '@jest/globals';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const BASE_URL = process.env.PUBLIC_URL ?? 'http://127.0.0.1:3010';
export const SHOT_DIR = process.env.E2E_SHOT_DIR ?? '/tmp/endgrain-e2e';

const FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

export const PHONE = { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true };
export const DESKTOP = { viewport: { width: 1440, height: 900 }, isMobile: false, hasTouch: false };

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: '/usr/bin/chromium', args: FLAGS });
}

export interface Session {
  context: BrowserContext;
  page: Page;
  /** Console errors and uncaught page errors seen so far. */
  errors: string[];
}

/** A fresh browser profile (no stored token) at phone or desktop size. */
export async function openSession(browser: Browser, device: typeof PHONE | typeof DESKTOP = DESKTOP): Promise<Session> {
  const context = await browser.newContext({ ...device, baseURL: BASE_URL });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(m.text());
  });
  page.on('pageerror', (e) => errors.push(e.message));
  return { context, page, errors };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: `${SHOT_DIR}/${name}.png`, fullPage: true });
}

/**
 * Reads a value until it equals what is expected, or gives up after the timeout and returns the
 * last reading (so the test's own assertion prints the difference). For screens that re-render
 * after a navigation, where a single read can still see the previous view.
 */
export async function settled<T>(read: () => Promise<T>, expected: T, timeoutMs = 10_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  let value = await read();
  while (JSON.stringify(value) !== JSON.stringify(expected) && Date.now() < until) {
    await new Promise((resolve) => setTimeout(resolve, 100));
    value = await read();
  }
  return value;
}

/** One Chromium for a describe block: launched before its tests (with the shot folder made), closed after. */
export function useChromium(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    mkdirSync(SHOT_DIR, { recursive: true });
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('Chromium is not running yet: call the getter inside a test.');
    return browser;
  };
}
