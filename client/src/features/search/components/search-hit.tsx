import { grainMapHref, HIGHLIGHT_PRE } from '@endgrain/shared';
import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import type { KnowledgeHit } from '../api/knowledge-hit.js';
import { facetValueLabel } from '../lib/search-labels.js';
import { HighlightedText } from './highlighted-text.js';

/** One result: the title and summary with the matched words marked, its tags, and for a finding its Grain Map row. */
export function SearchHit({ hit }: { hit: KnowledgeHit }) {
  const title = hit._formatted?.title ?? hit.title;
  const summary = hit._formatted?.summary ?? hit.summary;
  const excerpt = hit._formatted?.text;
  const showExcerpt = excerpt !== undefined && excerpt.includes(HIGHLIGHT_PRE) && !summary.includes(HIGHLIGHT_PRE);
  const species = hit.species[0];
  const tags = [
    ...hit.species.map((v) => facetValueLabel('species', v)),
    ...hit.condition.map((v) => facetValueLabel('condition', v)),
    ...hit.grind.map((v) => facetValueLabel('grind', v)),
  ];
  return (
    <Paper component="article" variant="outlined" sx={{ p: 2 }}>
      <Stack spacing={1}>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
          <Chip size="small" label={facetValueLabel('kind', hit.kind)} color={hit.kind === 'SAFETY_NOTE' ? 'warning' : hit.kind === 'FINDING' ? 'primary' : 'default'} />
          <Typography variant="caption" color="text.secondary">
            {hit.authorName}
          </Typography>
        </Stack>
        <Typography variant="h2" sx={{ fontSize: '1.15rem', fontWeight: 700 }}>
          <Link component={RouterLink} to={hit.url} sx={{ display: 'inline-block', minHeight: 28 }}>
            <HighlightedText value={title} />
          </Link>
        </Typography>
        <Typography variant="body2">
          <HighlightedText value={summary} />
        </Typography>
        {showExcerpt && (
          <Typography variant="body2" color="text.secondary">
            <HighlightedText value={excerpt} />
          </Typography>
        )}
        {tags.length > 0 && (
          <Typography variant="caption" color="text.secondary">
            {tags.join(' · ')}
          </Typography>
        )}
        {hit.kind === 'FINDING' && species && (
          <Link component={RouterLink} to={grainMapHref({ species, condition: hit.condition[0] ?? null })} variant="body2" sx={{ alignSelf: 'flex-start', minHeight: 24 }}>
            See the Grain Map row for {facetValueLabel('species', species)}
            {hit.condition[0] ? ` (${facetValueLabel('condition', hit.condition[0])})` : ''}
          </Link>
        )}
      </Stack>
    </Paper>
  );
}
