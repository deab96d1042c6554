import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { renderMarkdown } from './render-markdown.js';

const ALLOWED_TAGS = new Set(['h2', 'h3', 'h4', 'h5', 'h6', 'p', 'strong', 'em', 'del', 'code', 'pre', 'ul', 'ol', 'li', 'table', 'thead', 'tbody', 'tr', 'th', 'td', 'blockquote', 'hr', 'a', 'img']);
const ALLOWED_ATTRIBUTES = new Set(['href', 'rel', 'src', 'alt', 'loading', 'class', 'start']);

/** Every tag in the output with its attribute names and values, read the way a browser tokenises them. */
function tags(html: string): { name: string; attributes: [string, string][] }[] {
  return [...html.matchAll(/<\/?([a-zA-Z][a-zA-Z0-9]*)([^>]*)>/g)].map((m) => ({
    name: (m[1] as string).toLowerCase(),
    attributes: [...(m[2] as string).matchAll(/([^\s="']+)(?:="([^"]*)")?/g)].map((a) => [(a[1] as string).toLowerCase(), a[2] ?? '']),
  }));
}

function assertInert(html: string): void {
  for (const tag of tags(html)) {
    expect(ALLOWED_TAGS).toContain(tag.name);
    for (const [name, value] of tag.attributes) {
      expect(ALLOWED_ATTRIBUTES).toContain(name);
      if (name === 'href') expect(value).toMatch(/^(https?:|mailto:|\/(?!\/)|#|\.{1,2}\/|[^:/?#]*(?:[/?#]|$))/i);
      if (name === 'src') expect(value).toMatch(/^\/api\//);
    }
  }
  expect(html).not.toMatch(/<script/i);
  expect(html).not.toMatch(/href="\s*(javascript|data|vbscript):/i);
}

describe('renderMarkdown: escaping first makes raw HTML inert', () => {
  it('has a checker that does catch a live handler or script link (so the checks below can fail)', () => {
    expect(() => assertInert('<img src="/api/x" onerror="alert(1)">')).toThrow();
    expect(() => assertInert('<a href="javascript:alert(1)">x</a>')).toThrow();
    expect(() => assertInert('<script>alert(1)</script>')).toThrow();
  });

  it('prints a script tag as text', () => {
    const html = renderMarkdown('<script>alert(1)</script>');
    expect(html).toBe('<p>&lt;script&gt;alert(1)&lt;/script&gt;</p>');
  });

  it('prints an image with an onerror handler as text', () => {
    const html = renderMarkdown('<img src=x onerror="alert(1)">');
    expect(html).toBe('<p>&lt;img src=x onerror=&quot;alert(1)&quot;&gt;</p>');
    assertInert(html);
  });

  it('drops a javascript: link and keeps its words', () => {
    expect(renderMarkdown('[click](javascript:alert(1))')).not.toContain('<a');
    expect(renderMarkdown('[click](javascript:alert)')).toBe('<p>click</p>');
  });

  it('drops a javascript: link whatever its letter case', () => {
    expect(renderMarkdown('[x](JaVaScRiPt:alert)')).toBe('<p>x</p>');
  });

  it('drops entity-encoded and percent-encoded schemes', () => {
    for (const url of ['&#106;avascript:alert', '&#x6A;avascript:alert', 'java&#09;script:alert', '%6Aavascript:alert']) {
      const html = renderMarkdown(`[x](${url})`);
      expect(html).toBe('<p>x</p>');
    }
  });

  it('drops data:, vbscript: and protocol-relative links', () => {
    for (const url of ['data:text/html;base64,PHNjcmlwdD4=', 'vbscript:msgbox', '//evil.example.org/']) {
      expect(renderMarkdown(`[x](${url})`)).toBe('<p>x</p>');
    }
  });

  it('refuses a link that tries to break out of its attribute', () => {
    const html = renderMarkdown('[x](https://example.org/"onmouseover="alert)');
    expect(html).toBe('<p>x</p>');
  });

  it('keeps http(s), mailto and relative links, with rel set', () => {
    expect(renderMarkdown('[guide](https://example.org/a?b=1&c=2)')).toBe(
      '<p><a href="https://example.org/a?b=1&amp;c=2" rel="nofollow noopener noreferrer">guide</a></p>',
    );
    expect(renderMarkdown('[mail](mailto:coach@example.org)')).toContain('href="mailto:coach@example.org"');
    expect(renderMarkdown('[map](/grain-map?species=quaking-aspen)')).toContain('href="/grain-map?species=quaking-aspen"');
  });

  it('shows only pictures served by our own API', () => {
    expect(renderMarkdown('![block face](/api/field-notes/images/abc-123)')).toBe(
      '<p><img src="/api/field-notes/images/abc-123" alt="block face" loading="lazy"></p>',
    );
    expect(renderMarkdown('![x](data:image/png;base64,AAAA)')).toBe('<p>x</p>');
    expect(renderMarkdown('![x](https://example.org/a.png)')).toBe('<p>x</p>');
    expect(renderMarkdown('![x](/api/../secret)')).toBe('<p>x</p>');
  });

  it('cannot be tricked with a NUL character into forging a placeholder', () => {
    const html = renderMarkdown('`a` \u00000\u0000 [b](javascript:x)');
    expect(html).toBe('<p><code>a</code> 0 b</p>');
  });

  it('stays inside its tag and attribute whitelist for any input', () => {
    const pieces = fc.constantFrom('<', '>', '"', "'", '&', '#', ':', '(', ')', '[', ']', '!', '*', '_', '`', '|', '-', '\n', ' ', 'javascript', 'on', 'error=', 'script', 'a', '1', '/', 'http', '&#106;', '\\');
    fc.assert(
      fc.property(fc.array(pieces, { maxLength: 60 }), (parts) => {
        assertInert(renderMarkdown(parts.join('')));
      }),
      { numRuns: 400, seed: 20261201 },
    );
  });
});

describe('renderMarkdown: the whitelist', () => {
  it('makes "#" a second-level heading, since the title is the page heading', () => {
    expect(renderMarkdown('# Safety first\n### Boots')).toBe('<h2>Safety first</h2>\n<h4>Boots</h4>');
  });

  it('renders emphasis and inline code, leaving snake_case alone', () => {
    expect(renderMarkdown('**keen** edge, *light* touch, `hone` it, a_b_c')).toBe(
      '<p><strong>keen</strong> edge, <em>light</em> touch, <code>hone</code> it, a_b_c</p>',
    );
  });

  it('honours backslash escapes', () => {
    expect(renderMarkdown('\\*not emphasis\\*')).toBe('<p>*not emphasis*</p>');
  });

  it('renders bullet and numbered lists, nested by indentation', () => {
    expect(renderMarkdown('- boots\n- shin guards\n  - steel\n- glasses')).toBe(
      '<ul><li>boots</li><li>shin guards\n<ul><li>steel</li></ul></li><li>glasses</li></ul>',
    );
    expect(renderMarkdown('3. third\n4. fourth')).toBe('<ol start="3"><li>third</li><li>fourth</li></ol>');
  });

  it('renders a table with column alignment', () => {
    expect(renderMarkdown('| grind | s |\n| :--- | ---: |\n| chisel | 24.31 |')).toBe(
      '<table><thead><tr><th class="align-left">grind</th><th class="align-right">s</th></tr></thead>' +
        '<tbody><tr><td class="align-left">chisel</td><td class="align-right">24.31</td></tr></tbody></table>',
    );
  });

  it('keeps fenced code verbatim, escaped, without inline formatting', () => {
    expect(renderMarkdown('```\n<b>**x**</b>\n```')).toBe('<pre><code>&lt;b&gt;**x**&lt;/b&gt;</code></pre>');
  });

  it('renders quotes, rules and paragraphs', () => {
    expect(renderMarkdown('> sheath it\n\n---\n\nnext one\nsame one')).toBe(
      '<blockquote><p>sheath it</p></blockquote>\n<hr>\n<p>next one\nsame one</p>',
    );
  });
});
