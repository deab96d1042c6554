import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';

import type { NoteTags as Tags } from '../api/types.js';
import { tagChips } from '../lib/note-labels.js';

/** The note's tags as quiet chips; each tells a screen reader which group it belongs to. */
export function NoteTags({ tags, size = 'small' }: { tags: Tags; size?: 'small' | 'medium' }) {
  const chips = tagChips(tags);
  if (chips.length === 0) return null;
  return (
    <Stack direction="row" component="ul" aria-label="Tags" sx={{ flexWrap: 'wrap', gap: 0.75, p: 0, m: 0, listStyle: 'none' }}>
      {chips.map((chip) => (
        <li key={chip.key}>
          <Chip size={size} variant="outlined" label={chip.label} aria-label={`${chip.group}: ${chip.label}`} />
        </li>
      ))}
    </Stack>
  );
}
