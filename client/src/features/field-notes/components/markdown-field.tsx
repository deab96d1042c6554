import { renderMarkdown } from '@endgrain/shared';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';

import { ImageUploadButton } from './image-upload-button.js';
import { NoteBody } from './note-body.js';

export interface MarkdownFieldProps {
  value: string;
  onChange: (text: string) => void;
  error?: string;
}

/**
 * The note's text in markdown, with a preview drawn by the same strict renderer the server uses
 * when it saves (so the preview can never run anything the saved note would not).
 */
export function MarkdownField({ value, onChange, error }: MarkdownFieldProps) {
  const [tab, setTab] = useState<'write' | 'preview'>('write');
  return (
    <Stack spacing={1}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: 1 }}>
        <Tabs value={tab} onChange={(_, next: 'write' | 'preview') => setTab(next)} aria-label="Write or preview the text">
          <Tab value="write" label="Write" sx={{ minHeight: 44 }} />
          <Tab value="preview" label="Preview" sx={{ minHeight: 44 }} />
        </Tabs>
        <ImageUploadButton onUploaded={(markdown) => onChange(`${value.replace(/\s*$/, '')}\n\n${markdown}\n`)} />
      </Stack>
      {tab === 'write' ? (
        <TextField
          label="Note text (markdown)"
          value={value}
          onChange={(event) => onChange(event.target.value)}
          multiline
          minRows={14}
          fullWidth
          error={Boolean(error)}
          helperText={error ?? 'Markdown: # heading, **bold**, *italic*, - lists, | tables |, [link](https://…). HTML is shown as text.'}
          slotProps={{ htmlInput: { spellCheck: true, style: { fontFamily: 'ui-monospace, monospace', fontSize: '0.95rem' } } }}
        />
      ) : (
        <Box sx={{ border: 1, borderColor: 'divider', borderRadius: 1, p: 2, minHeight: 200 }} aria-label="Preview" role="region">
          {value.trim() ? <NoteBody html={renderMarkdown(value)} /> : <Typography color="text.secondary">Nothing to preview yet.</Typography>}
        </Box>
      )}
    </Stack>
  );
}
