import { useQuery } from '@apollo/client/react';
import { formatLength, formatTime } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import type { Theme } from '@mui/material/styles';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { grainMapDocuments } from '../api/grain-map-documents.js';
import type { GrainMapFilter, GrainRow, GrainTrialRow } from '../api/types.js';
import { effectWords } from '../lib/effect-colour.js';
import { LABEL_WORDS } from './grain-matrix-table.js';

export interface CellDetailProps {
  filter: GrainMapFilter;
  speciesId: string;
  speciesName: string;
  grind: string;
  imperial: boolean;
  onClose: () => void;
}

/** The results and trials behind one cell, side by side, so a reader can check the number. */
export function CellDetail({ filter, speciesId, speciesName, grind, imperial, onClose }: CellDetailProps) {
  const { data, loading, error } = useQuery(grainMapDocuments.cell, { variables: { filter, species: speciesId, grind } });
  const length = (mm: number) => formatLength(mm, imperial ? 'imperial' : 'metric', { digits: imperial ? 1 : 0 });
  // On a phone the athlete, the time and the ratio come first so they fit without scrolling sideways.
  const resultColumns: GridColDef<GrainRow>[] = [
    { field: 'athleteName', headerName: 'Athlete', flex: 1, minWidth: 130 },
    { field: 'hundredths', headerName: 'Time', width: 80, valueFormatter: (v: number) => formatTime(v) },
    { field: 'ratio', headerName: 'vs own usual', width: 110, valueFormatter: (v: number | null) => (v === null ? 'only result' : v.toFixed(3)) },
    { field: 'normalisedHundredths', headerName: 'On reference block', width: 140, valueFormatter: (v: number) => formatTime(Math.round(v)) },
    { field: 'diameterMm', headerName: 'Block', width: 90, valueFormatter: (v: number) => length(v) },
    { field: 'meetDate', headerName: 'Date', width: 110 },
    { field: 'meetName', headerName: 'Meet', flex: 1, minWidth: 130 },
    { field: 'includedDeg', headerName: 'Bevel', width: 80, valueFormatter: (v: number | null) => (v === null ? '—' : `${v}°`) },
  ];
  const trialColumns: GridColDef<GrainTrialRow>[] = [
    { field: 'testedOn', headerName: 'Tested', width: 110 },
    { field: 'condition', headerName: 'Condition', width: 110 },
    { field: 'diameterMm', headerName: 'Block', width: 90, valueFormatter: (v: number) => length(v) },
    { field: 'axeLabel', headerName: 'Axe', flex: 1 },
    { field: 'ratioToReference', headerName: 'Depth vs reference', width: 150, valueFormatter: (v: number) => v.toFixed(2) },
  ];
  const phone = useMediaQuery((theme: Theme) => theme.breakpoints.down('sm'));
  const detail = data?.grainCell;
  const cell = detail?.cells[0];
  return (
    <Dialog open onClose={onClose} fullWidth fullScreen={phone} maxWidth="lg" aria-labelledby="grain-cell-title">
      <DialogTitle id="grain-cell-title">{speciesName}, {grind} grind</DialogTitle>
      <DialogContent>
        {loading && <PageLoading />}
        {error && <Alert severity="error">Could not load this cell: {error.message}</Alert>}
        {detail && (
          <>
            {cell && (
              <Typography sx={{ mb: 2 }}>
                Race times: {cell.results} results from {cell.athletes} athletes; median on the reference block {formatTime(Math.round(cell.medianHundredths))}.
                {cell.effect !== null && ` Against the same athletes' usual times: ${cell.clearDifference ? effectWords(cell.effect) : 'no clear difference'} (${cell.effectLow!.toFixed(3)}–${cell.effectHigh!.toFixed(3)}).`}
                {' '}Evidence: {LABEL_WORDS[cell.label]}.
              </Typography>
            )}
            <Typography variant="h6" component="h3">Results behind this cell</Typography>
            <DataGrid rows={detail.rows} columns={resultColumns} getRowId={(r) => r.resultId} density="compact" disableVirtualization autoHeight pageSizeOptions={[25, 100]} initialState={{ pagination: { paginationModel: { pageSize: 25 } } }} />
            <Typography variant="h6" component="h3" sx={{ mt: 3 }}>Trials with this grind on this wood</Typography>
            {detail.trialRows.length === 0 ? (
              <Typography color="text.secondary">No published trials yet. A club can run a trial against its reference axe and publish it to add this second kind of evidence.</Typography>
            ) : (
              <>
                {detail.trials.map((t) => (
                  <Typography key={t.key} variant="body2">{t.condition}: depth {t.ratio.toFixed(2)} × the reference axe ({t.axeRows} axe rows, {t.trials} trials; {LABEL_WORDS[t.label]})</Typography>
                ))}
                <DataGrid rows={detail.trialRows} columns={trialColumns} getRowId={(r) => `${r.trialId}-${r.axeLabel}`} density="compact" disableVirtualization autoHeight hideFooter />
              </>
            )}
          </>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} size="large" sx={{ minHeight: 44 }}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
