import { SEARCH_FACETS, type FacetSelection, type SearchFacet } from '@endgrain/shared';
import Button from '@mui/material/Button';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

import { FACET_TITLES, facetValueLabel } from '../lib/search-labels.js';

export interface FacetPanelProps {
  distribution: Partial<Record<string, Record<string, number>>>;
  selection: FacetSelection;
  onToggle: (facet: SearchFacet, value: string) => void;
  onClear: () => void;
}

/** Narrow the results by kind, species, grind, event and condition; counts come from the search itself. */
export function FacetPanel({ distribution, selection, onToggle, onClear }: FacetPanelProps) {
  const any = SEARCH_FACETS.some((f) => (selection[f] ?? []).length > 0);
  return (
    <Stack component="nav" aria-label="Filter the results" spacing={2}>
      {SEARCH_FACETS.map((facet) => {
        const counts = distribution[facet] ?? {};
        const chosen = selection[facet] ?? [];
        // A chosen value stays listed even when the current words leave no hits for it, so it can be unticked.
        const values = [...new Set([...chosen, ...Object.keys(counts)])].sort((a, b) => (counts[b] ?? 0) - (counts[a] ?? 0) || a.localeCompare(b));
        if (values.length === 0) return null;
        return (
          <FormGroup key={facet} aria-labelledby={`facet-${facet}`}>
            <Typography id={`facet-${facet}`} variant="subtitle2" sx={{ fontWeight: 700 }}>
              {FACET_TITLES[facet]}
            </Typography>
            {values.map((value) => (
              <FormControlLabel
                key={value}
                control={<Checkbox checked={chosen.includes(value)} onChange={() => onToggle(facet, value)} />}
                label={`${facetValueLabel(facet, value)} (${counts[value] ?? 0})`}
                sx={{ minHeight: 40 }}
              />
            ))}
          </FormGroup>
        );
      })}
      {any && (
        <Button onClick={onClear} sx={{ alignSelf: 'flex-start' }}>
          Clear filters
        </Button>
      )}
    </Stack>
  );
}
