import { diffLines, type DiffLine } from '@endgrain/shared';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';

import type { NoteRevision } from '../api/types.js';

const SIGN: Record<DiffLine['kind'], string> = { same: ' ', added: '+', removed: '−' };
const SPOKEN: Record<DiffLine['kind'], string> = { same: '', added: 'Added: ', removed: 'Removed: ' };

/** The whole revision as lines: title, summary, then the markdown. */
export function revisionText(r: NoteRevision): string {
  return [`Title: ${r.title}`, `Summary: ${r.summary}`, '', r.bodyMarkdown].join('\n');
}

/** A line-by-line comparison of two revisions: removed lines struck in red, added ones in green. */
export function RevisionDiff({ older, newer }: { older: NoteRevision; newer: NoteRevision }) {
  const lines = diffLines(revisionText(older), revisionText(newer));
  const changed = lines.filter((l) => l.kind !== 'same').length;
  return (
    <Box>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
        {changed === 0 ? 'The two revisions have the same text.' : `${changed} line${changed === 1 ? '' : 's'} changed from revision ${older.number} to revision ${newer.number}.`}
      </Typography>
      <Box component="ol" aria-label={`Changes from revision ${older.number} to ${newer.number}`} sx={{ listStyle: 'none', p: 0, m: 0, fontFamily: 'ui-monospace, monospace', fontSize: '0.875rem', border: 1, borderColor: 'divider', borderRadius: 1, overflowX: 'auto' }}>
        {lines.map((line, i) => (
          <Box
            component="li"
            key={i}
            sx={{
              display: 'grid',
              gridTemplateColumns: '3.5em 3.5em 1.5em 1fr',
              whiteSpace: 'pre-wrap',
              px: 1,
              bgcolor: line.kind === 'added' ? 'rgba(46, 125, 50, 0.12)' : line.kind === 'removed' ? 'rgba(198, 40, 40, 0.12)' : 'transparent',
              textDecoration: line.kind === 'removed' ? 'line-through' : 'none',
            }}
          >
            <Box component="span" aria-hidden sx={{ color: 'text.secondary' }}>{line.before ?? ''}</Box>
            <Box component="span" aria-hidden sx={{ color: 'text.secondary' }}>{line.after ?? ''}</Box>
            <Box component="span" aria-hidden>{SIGN[line.kind]}</Box>
            <span>
              {SPOKEN[line.kind] && <Box component="span" sx={{ position: 'absolute', width: 1, height: 1, overflow: 'hidden', clip: 'rect(0 0 0 0)' }}>{SPOKEN[line.kind]}</Box>}
              {line.text || ' '}
            </span>
          </Box>
        ))}
      </Box>
    </Box>
  );
}
