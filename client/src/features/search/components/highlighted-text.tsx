import { highlightParts } from '@endgrain/shared';
import Box from '@mui/material/Box';

/** Search highlights as text nodes with <mark>: the document text is never treated as HTML. */
export function HighlightedText({ value }: { value: string }) {
  return (
    <>
      {highlightParts(value).map((part, i) =>
        part.marked ? (
          <Box component="mark" key={i} sx={{ bgcolor: 'rgba(201, 166, 107, 0.45)', color: 'inherit', borderRadius: 0.5, px: 0.25 }}>
            {part.text}
          </Box>
        ) : (
          <span key={i}>{part.text}</span>
        ),
      )}
    </>
  );
}
