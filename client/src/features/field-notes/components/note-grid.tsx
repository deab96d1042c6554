import Box from '@mui/material/Box';

import type { FieldNote } from '../api/types.js';
import { NoteCard } from './note-card.js';

/** Notes as cards: one column on a phone, up to three on a laptop. */
export function NoteGrid({ notes, hrefFor, showStatus = false }: { notes: FieldNote[]; hrefFor: (note: FieldNote) => string; showStatus?: boolean }) {
  return (
    <Box component="section" sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', sm: 'repeat(2, minmax(0, 1fr))', lg: 'repeat(3, minmax(0, 1fr))' } }}>
      {notes.map((note) => (
        <NoteCard key={`${note.id}-${note.revisionId}`} note={note} href={hrefFor(note)} showStatus={showStatus} />
      ))}
    </Box>
  );
}
