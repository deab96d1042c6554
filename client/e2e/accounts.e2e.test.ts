import { describe, expect, it } from '@jest/globals';

import { seriousViolations } from './support/a11y';
import { freshEmail } from './support/accounts';
import { DESKTOP, PHONE, openSession, screenshot, useChromium } from './support/browser';
import { firstLink, waitForMail } from './support/mail';

const PASSWORD = 'springboard above the pocket';

describe('a newcomer signs up in Chromium', () => {
  const browser = useChromium();

  it('signs up, confirms the e-mail from the mail sink, signs in and sees the account page', async () => {
    const email = freshEmail('browser');
    const { page, context, errors } = await openSession(browser(), PHONE);
    const violations: string[] = [];

    await page.goto('/sign-up');
    await page.getByRole('heading', { name: 'Create account' }).waitFor();
    violations.push(...(await seriousViolations(page)).map((v) => `sign-up: ${v}`));
    await page.getByLabel('Display name').fill('Linnea Marrowdale');
    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('button', { name: 'Account menu for Linnea Marrowdale' }).waitFor();

    // Open the link from the real e-mail in a fresh, signed-out profile.
    const link = firstLink(await waitForMail(email, /confirm your e-mail/i));
    await context.close();
    const second = await openSession(browser(), PHONE);
    await second.page.goto(link);
    await second.page.getByText(`${email} is confirmed`).waitFor();
    violations.push(...(await seriousViolations(second.page)).map((v) => `verify: ${v}`));
    await screenshot(second.page, 'accounts-verified-phone');
    await second.page.getByRole('link', { name: 'Sign in' }).first().click();

    await second.page.getByRole('heading', { name: 'Sign in' }).waitFor();
    violations.push(...(await seriousViolations(second.page)).map((v) => `sign-in: ${v}`));
    await second.page.getByLabel('Email').fill(email);
    await second.page.getByLabel('Password', { exact: true }).fill(PASSWORD);
    await second.page.getByRole('button', { name: 'Sign in' }).click();
    await second.page.getByRole('button', { name: 'Account menu for Linnea Marrowdale' }).waitFor();

    await second.page.goto('/account');
    await second.page.getByRole('heading', { name: 'Your account' }).waitFor();
    await expect(second.page.getByText(email).first().isVisible()).resolves.toBe(true);
    await second.page.getByText('Confirmed', { exact: true }).waitFor();
    violations.push(...(await seriousViolations(second.page)).map((v) => `account: ${v}`));
    await screenshot(second.page, 'accounts-account-phone');

    expect(violations).toEqual([]);
    expect([...errors, ...second.errors]).toEqual([]);
    await second.context.close();
  });

  it('shows the same error for a wrong password as for an unknown address', async () => {
    const { page, context } = await openSession(browser(), DESKTOP);
    await page.goto('/sign-in');
    await page.getByLabel('Email').fill('coach@example.org');
    await page.getByLabel('Password', { exact: true }).fill('certainly not it');
    await page.getByRole('button', { name: 'Sign in' }).click();
    const wrong = await page.getByRole('alert').textContent();
    await page.getByLabel('Email').fill(freshEmail('nobody'));
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForTimeout(500);
    const unknown = await page.getByRole('alert').textContent();
    expect(wrong).toContain('E-mail or password is not right.');
    expect(unknown).toBe(wrong);
    await screenshot(page, 'accounts-sign-in-error-desktop');
    await context.close();
  });
});
