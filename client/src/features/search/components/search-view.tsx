import ExpandMoreIcon from '@mui/icons-material/ExpandMore';
import SearchIcon from '@mui/icons-material/Search';
import Accordion from '@mui/material/Accordion';
import AccordionDetails from '@mui/material/AccordionDetails';
import AccordionSummary from '@mui/material/AccordionSummary';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import LinearProgress from '@mui/material/LinearProgress';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import type { Theme } from '@mui/material/styles';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import { useKnowledgeSearch } from '../hooks/use-knowledge-search.js';
import { useSearchFilter } from '../lib/use-search-filter.js';
import { FacetPanel } from './facet-panel.js';
import { SearchHit } from './search-hit.js';

const EXAMPLES = ['grind for wet poplar', 'frozen blocks', 'first meet', 'handle checks'];
const PAGE = 20;

/** The search page: results as you type, with highlights and facets, and honest empty and error states. */
export function SearchView() {
  const { words, selection, setWords, toggle, clearFacets } = useSearchFilter();
  const [shown, setShown] = useState({ key: '', limit: PAGE });
  const key = JSON.stringify([words, selection]);
  // New words or filters start again from the first page of results.
  const limit = shown.key === key ? shown.limit : PAGE;
  const { response, isFetching, error, retry, ready } = useKnowledgeSearch(words, selection, limit);
  const hits = response?.hits ?? [];
  const chosen = Object.values(selection).reduce((n, v) => n + (v?.length ?? 0), 0);
  const filtered = chosen > 0;
  const idle = words.trim() === '' && !filtered;
  const wide = useMediaQuery((theme: Theme) => theme.breakpoints.up('md'));
  const facets = <FacetPanel distribution={response?.facetDistribution ?? {}} selection={selection} onToggle={toggle} onClear={clearFacets} />;
  const total = response?.estimatedTotalHits ?? hits.length;

  return (
    <Stack spacing={2}>
      <TextField
        type="search"
        label="Search Field Notes"
        value={words}
        onChange={(event) => setWords(event.target.value)}
        placeholder="Ask a question, e.g. grind for wet poplar"
        fullWidth
        autoFocus={words === ''}
        slotProps={{ input: { startAdornment: <InputAdornment position="start"><SearchIcon aria-hidden /></InputAdornment> }, htmlInput: { enterKeyHint: 'search' } }}
      />
      <Box sx={{ height: 4 }}>{isFetching && <LinearProgress aria-label="Searching" />}</Box>
      {error && (
        <Alert severity="error" role="alert" action={<Button color="inherit" onClick={retry}>Try again</Button>}>
          Search is not available right now ({error.message}). Field Notes can still be browsed from the{' '}
          <Link component={RouterLink} to={paths.fieldNotes.href()} color="inherit">
            Field Notes page
          </Link>
          .
        </Alert>
      )}
      {!error && ready && (
        <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', md: '240px minmax(0, 1fr)' }, alignItems: 'start' }}>
          {wide ? (
            facets
          ) : (
            <Accordion variant="outlined" disableGutters>
              <AccordionSummary expandIcon={<ExpandMoreIcon />} sx={{ minHeight: 48 }}>
                Filters{chosen ? ` (${chosen} chosen)` : ''}
              </AccordionSummary>
              <AccordionDetails>{facets}</AccordionDetails>
            </Accordion>
          )}
          <Stack spacing={2} aria-live="polite" aria-busy={isFetching}>
            {!idle && response && (
              <Typography variant="body2" color="text.secondary">
                {total === 1 ? '1 note found' : `${total} notes found`}
              </Typography>
            )}
            {idle && hits.length > 0 && <Typography variant="body2" color="text.secondary">Newest notes first. Type to search, or tick a filter.</Typography>}
            {hits.map((hit) => (
              <SearchHit key={hit.id} hit={hit} />
            ))}
            {hits.length > 0 && hits.length < total && (
              <Button variant="outlined" onClick={() => setShown({ key, limit: limit + PAGE })} sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
                Show more results
              </Button>
            )}
            {response && hits.length === 0 && idle && (
              <Paper variant="outlined" sx={{ p: 3 }}>
                <Typography>Nothing has been published yet. Coaches write Field Notes; check back after the first ones are reviewed.</Typography>
              </Paper>
            )}
            {response && hits.length === 0 && !idle && (
              <Paper variant="outlined" sx={{ p: 3 }}>
                <Typography>
                  {`Nothing matches${words.trim() ? ` “${words.trim()}”` : ''}${filtered ? ' with these filters' : ''}.`} {filtered ? 'Clear a filter, or try' : 'Try'} fewer or other
                  words, for example:
                </Typography>
                <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1, mt: 1.5 }}>
                  {EXAMPLES.map((example) => (
                    <Button key={example} variant="outlined" size="small" onClick={() => setWords(example)}>
                      {example}
                    </Button>
                  ))}
                </Stack>
              </Paper>
            )}
          </Stack>
        </Box>
      )}
    </Stack>
  );
}
