import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';

/** Serious and critical accessibility violations on the page (WCAG 2 A and AA rules). */
export async function seriousViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page: page as never }).withTags(['wcag2a', 'wcag2aa']).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join('; ')})`);
}
