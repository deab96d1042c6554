import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { authToken } from '../../../lib/auth-token.js';
import { grainMapDocuments } from '../api/grain-map-documents.js';
import type { GrainOptions } from '../api/types.js';
import { csvQuery, useGrainFilter } from '../lib/use-grain-filter.js';
import { CellDetail } from './cell-detail.js';
import { GrainFilters } from './grain-filters.js';
import { GrainMatrixTable } from './grain-matrix-table.js';
import { MethodNote } from './method-note.js';
import { sentenceCase } from '../../../lib/sentence-case.js';

/** The map for the chosen filters, a sentence per wood, the method and the CSV export. */
export function GrainMapView({ options, imperial }: { options: GrainOptions; imperial: boolean }) {
  const fallback = options.eventTypes.find((e) => e.code === 'underhand-chop')?.id ?? options.eventTypes[0]?.id ?? '';
  const { filter, setFilter, variables } = useGrainFilter(fallback);
  const { data, loading, error } = useQuery(grainMapDocuments.map, { variables: { filter: variables }, skip: !variables.eventTypeId });
  const whole = data?.grainMap;
  const one = whole?.species.filter((s) => s.speciesId === filter.species) ?? [];
  const map = whole && one.length > 0 ? { ...whole, species: one } : whole;
  const [openSpecies, openGrind] = filter.cell.split('~');
  const download = async () => {
    const token = authToken.get();
    const res = await fetch(`/api/grain-map.csv?${csvQuery(variables)}`, { headers: token ? { authorization: `Bearer ${token}` } : {} });
    const url = URL.createObjectURL(await res.blob());
    const a = Object.assign(document.createElement('a'), { href: url, download: 'grain-map.csv' });
    a.click();
    URL.revokeObjectURL(url);
  };
  return (
    <Stack spacing={3}>
      <GrainFilters filter={filter} onChange={setFilter} options={options} species={whole?.species ?? []} />
      {loading && <PageLoading />}
      {error && <Alert severity="error">Could not compute the map: {error.message}</Alert>}
      {map && map.cells.length === 0 && (
        <Alert severity="info">No finished results with a recorded head match these filters. Widen the seasons, clubs or diameter range, or record the axe used when results are posted.</Alert>
      )}
      {map && map.cells.length > 0 && (
        <>
          <Typography variant="body2" color="text.secondary">
            {map.totalResults} results in {map.eventName}
            {map.skipped > 0 && `; ${map.skipped} left out because no head was recorded`}. Blue ran faster than the same athletes usually do, orange slower; a dashed edge means the evidence is not strong.
          </Typography>
          <GrainMatrixTable map={map} onOpen={(species, grind) => setFilter({ cell: `${species}~${grind}` })} />
          <Stack spacing={1} component="section" aria-labelledby="grain-woods">
            <Typography id="grain-woods" variant="h6" component="h2">Wood by wood</Typography>
            {map.species.map((s) => (
              <Paper key={s.speciesId} variant="outlined" sx={{ p: 1.5 }}>
                <Typography>{s.sentence}</Typography>
                {s.source && (
                  <Typography variant="caption" color="text.secondary" sx={{ display: "block" }}>
                    {sentenceCase(s.name)}: specific gravity {s.specificGravityGreen ?? '—'} green, {s.specificGravityDry ?? '—'} at 12 %; side hardness {s.hardnessLbfGreen ?? 'not published'} lbf green, {s.hardnessLbfDry ?? 'not published'} lbf at 12 %. Source: {s.source}.
                  </Typography>
                )}
              </Paper>
            ))}
          </Stack>
          <Button variant="outlined" onClick={() => void download()} sx={{ alignSelf: 'flex-start' }}>Download the matrix (CSV)</Button>
          <MethodNote settings={map.settings} />
        </>
      )}
      {openSpecies && openGrind && (
        <CellDetail filter={variables} speciesId={openSpecies} grind={openGrind} imperial={imperial} speciesName={sentenceCase(map?.species.find((s) => s.speciesId === openSpecies)?.name ?? openSpecies)} onClose={() => setFilter({ cell: '' })} />
      )}
    </Stack>
  );
}
