import Box from '@mui/material/Box';
import DOMPurify from 'dompurify';
import { useMemo } from 'react';

/** What a note's text may hold once rendered: the tags and attributes our renderer writes, nothing else. */
const ALLOWED = {
  ALLOWED_TAGS: ['h2', 'h3', 'h4', 'h5', 'h6', 'p', 'ul', 'ol', 'li', 'a', 'img', 'blockquote', 'code', 'pre', 'table', 'thead', 'tbody', 'tr', 'th', 'td', 'hr', 'br', 'strong', 'em', 'del'],
  ALLOWED_ATTR: ['href', 'src', 'alt', 'title', 'class', 'rel', 'loading', 'start'],
};

/**
 * The note's text as rendered by the shared renderer (everything the author typed escaped first,
 * then a fixed set of tags added), passed through DOMPurify as a second, maintained line of
 * defence before it is inserted: no script, event handler or javascript: link gets through either.
 */
export function NoteBody({ html }: { html: string }) {
  const clean = useMemo(() => DOMPurify.sanitize(html, ALLOWED), [html]);
  return (
    <Box
      className="note-body"
      sx={{
        maxWidth: '72ch',
        lineHeight: 1.65,
        overflowWrap: 'anywhere',
        '& h2': { typography: 'h5', mt: 4, mb: 1.5 },
        '& h3': { typography: 'h6', mt: 3, mb: 1 },
        '& h4, & h5, & h6': { typography: 'subtitle1', fontWeight: 700, mt: 2.5, mb: 1 },
        '& p, & ul, & ol': { my: 1.5 },
        '& li': { my: 0.5 },
        '& a': { color: 'primary.main', textUnderlineOffset: '0.15em' },
        '& img': { maxWidth: '100%', height: 'auto', borderRadius: 1, display: 'block', my: 2 },
        '& blockquote': { borderLeft: 4, borderColor: 'secondary.main', pl: 2, ml: 0, my: 2, color: 'text.secondary' },
        '& code': { fontFamily: 'ui-monospace, monospace', fontSize: '0.9em', bgcolor: 'action.hover', px: 0.5, borderRadius: 0.5 },
        '& pre': { bgcolor: 'action.hover', p: 2, borderRadius: 1, overflowX: 'auto' },
        '& pre code': { bgcolor: 'transparent', p: 0 },
        '& table': { borderCollapse: 'collapse', my: 2, display: 'block', overflowX: 'auto', maxWidth: '100%' },
        '& th, & td': { border: 1, borderColor: 'divider', px: 1.5, py: 0.75, textAlign: 'left', verticalAlign: 'top' },
        '& th': { bgcolor: 'action.hover', fontWeight: 700 },
        '& .align-right': { textAlign: 'right' },
        '& .align-center': { textAlign: 'center' },
        '& hr': { border: 0, borderTop: 1, borderColor: 'divider', my: 3 },
      }}
      dangerouslySetInnerHTML={{ __html: clean }}
    />
  );
}
