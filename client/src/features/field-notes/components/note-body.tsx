import Box from '@mui/material/Box';

/**
 * The note's text as the server rendered it. The HTML comes only from the server's strict
 * renderer (everything the author typed escaped first, then a fixed set of tags added), which
 * is why inserting it here is safe; nothing else is ever passed to dangerouslySetInnerHTML.
 */
export function NoteBody({ html }: { html: string }) {
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
      dangerouslySetInnerHTML={{ __html: html }}
    />
  );
}
