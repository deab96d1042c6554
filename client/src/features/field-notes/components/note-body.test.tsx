import { describe, expect, it } from '@jest/globals';
import { render } from '@testing-library/react';

import { NoteBody } from './note-body.js';

describe('NoteBody', () => {
  it('strips scripts, handlers and javascript: links even from HTML that did not come through the renderer', () => {
    const { container } = render(
      <NoteBody html={'<p>Keep <strong>edges</strong> sheathed</p><img src="/api/field-notes/images/x" alt="block" onerror="window.hacked=1"><a href="javascript:alert(1)">tap</a><script>window.hacked=2</script><iframe src="https://example.org"></iframe><ol start="3"><li>three</li></ol>'} />,
    );
    const body = container.querySelector('.note-body')!;
    expect(body.querySelector('script, iframe, [onerror]')).toBeNull();
    expect(body.querySelector('a')?.getAttribute('href')).toBeNull();
    // What our renderer writes survives.
    expect(body.querySelector('p strong')?.textContent).toBe('edges');
    expect(body.querySelector('img')?.getAttribute('alt')).toBe('block');
    expect(body.querySelector('ol')?.getAttribute('start')).toBe('3');
  });
});
