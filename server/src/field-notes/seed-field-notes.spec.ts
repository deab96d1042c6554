import { describe, expect, it } from '@jest/globals';

import { revisionValues } from './article-values.js';
import type { FieldNoteInput } from './dto/field-note.inputs.js';
import { FIRST_CUTS_SERIES } from './seed-field-notes.js';
import { DEMO_FINDINGS } from './seed/demo-findings.js';

const input = (n: (typeof DEMO_FINDINGS)[number]) =>
  ({ kind: n.kind, title: n.title, summary: n.summary, bodyMarkdown: n.body, tags: { species: [], grinds: [], events: [], conditions: [], free: [], ...n.tags }, evidence: (n.evidence ?? []).map((e) => ({ ...e, refId: null })), note: '' }) as unknown as FieldNoteInput;

describe('the demo Field Notes', () => {
  it('runs First Cuts in the order the newcomer series promises', () => {
    // The order newcomers meet the topics, as issue 8 lists them.
    expect(FIRST_CUTS_SERIES.map((n) => n.slug)).toEqual([
      'safety-first',
      'picking-a-block-and-a-face',
      'testing-an-axe-against-a-reference',
      'caring-for-an-edge',
      'handle-and-head-checks',
      'choosing-an-axe-for-the-wood',
      'what-to-expect-at-a-first-meet',
    ]);
    expect(FIRST_CUTS_SERIES.every((n) => n.kind !== 'FINDING')).toBe(true);
  });

  it('passes the same checks as a note written in the app, and defers to rules and coaching', () => {
    for (const note of [...FIRST_CUTS_SERIES, ...DEMO_FINDINGS]) {
      const values = revisionValues(input(note));
      expect(values.bodyHtml).toContain('sanctioning body');
      expect(values.bodyHtml).toContain('qualified coach');
      expect(values.bodyHtml).not.toMatch(/<script|javascript:/i);
    }
  });

  it('marks every demo finding as invented and links it to evidence', () => {
    for (const finding of DEMO_FINDINGS) {
      expect(finding.body.startsWith('**Demo finding.**')).toBe(true);
      expect(finding.summary.startsWith('Demo:')).toBe(true);
      expect(finding.evidence?.length).toBeGreaterThan(0);
    }
  });

  it('gives every note its own slug', () => {
    const slugs = [...FIRST_CUTS_SERIES, ...DEMO_FINDINGS].map((n) => n.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
  });
});
