import { useApolloClient } from '@apollo/client/react';
import { formatTime, SHEET_COLUMNS } from '@endgrain/shared';
import UploadFile from '@mui/icons-material/UploadFile';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useMutation } from '@tanstack/react-query';
import { useRef, useState } from 'react';

import { resultsDocuments } from '../api/results-documents.js';
import { uploadSheet, type SheetUploadAnswer } from '../api/upload-sheet.js';

const LIMIT_BYTES = 5 * 1024 * 1024;
const ACTION_LABELS = { NEW: 'New', CHANGED: 'Changed', UNCHANGED: 'Already saved' } as const;

/**
 * Upload a timekeepers' sheet: pick a CSV, see every row checked (problems listed by row and
 * column), then save it in one go. Nothing is saved until the preview is accepted. `upload`
 * is the REST call (tests pass their own).
 */
export function SheetUpload({ meetId, upload = uploadSheet }: { meetId: string; upload?: typeof uploadSheet }) {
  const apollo = useApolloClient();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState(0);
  const [saved, setSaved] = useState<string>();
  const check = useMutation({ mutationFn: (chosen: File) => upload(meetId, chosen, { dryRun: true, onProgress: setProgress }) });
  const commit = useMutation({
    mutationFn: (chosen: File) => upload(meetId, chosen, { dryRun: false, onProgress: setProgress }),
    onSuccess: async (answer) => {
      if (!answer.ok) return;
      setSaved(`Saved: ${answer.imported} ${answer.imported === 1 ? 'result' : 'results'} added or changed, ${answer.unchanged} already as in the sheet.`);
      setFile(null);
      check.reset();
      await apollo.refetchQueries({ include: [resultsDocuments.meetResults] });
    },
  });
  const choose = (chosen: File | undefined) => {
    setSaved(undefined);
    commit.reset();
    if (!chosen) return;
    setFile(chosen);
    if (chosen.size > LIMIT_BYTES) {
      check.reset();
      return;
    }
    setProgress(0);
    check.mutate(chosen);
  };
  const answer: SheetUploadAnswer | undefined = commit.data && !commit.data.ok ? commit.data : check.data;
  const busy = check.isPending || commit.isPending;
  const tooBig = Boolean(file && file.size > LIMIT_BYTES);

  return (
    <Paper variant="outlined" component="section" aria-labelledby="sheet-upload" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography id="sheet-upload" variant="h2">Upload a results sheet</Typography>
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>
          A CSV file (UTF-8, up to 5 MB) with a header row. Columns: {SHEET_COLUMNS.map((c) => c.name).join(', ')}. Headers may be in any case;
          pairs are written “A &amp; B”; lengths carry their unit (“12 in”, “6 mm”). Uploading the same sheet again changes nothing.
        </Typography>
        <Stack direction="row" sx={{ gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
          <input ref={input} type="file" accept=".csv,text/csv" hidden aria-label="Results sheet (CSV)" onChange={(e) => {
            choose(e.target.files?.[0]);
            // The same file, fixed and chosen again, must count as a new choice.
            e.target.value = '';
          }} />
          <Button variant="outlined" startIcon={<UploadFile />} onClick={() => input.current?.click()} disabled={busy} sx={{ minHeight: 44 }}>
            {file ? 'Choose another file' : 'Choose a CSV file'}
          </Button>
          {file && <Typography variant="body2">{file.name}</Typography>}
        </Stack>
        {tooBig && <Alert severity="error">That file is larger than 5 MB; split the sheet and upload the parts one after the other.</Alert>}
        {busy && (
          <Stack spacing={0.5}>
            <Typography variant="body2">{progress < 1 ? `Uploading… ${Math.round(progress * 100)} %` : check.isPending ? 'Checking every row…' : 'Saving…'}</Typography>
            <LinearProgress variant={progress < 1 ? 'determinate' : 'indeterminate'} value={progress * 100} aria-label="Upload progress" />
          </Stack>
        )}
        {(check.error || commit.error) && <Alert severity="error">{(check.error ?? commit.error)?.message}</Alert>}
        {saved && <Alert severity="success">{saved}</Alert>}
        {answer && !answer.ok && <SheetProblems problems={answer.problems} />}
        {answer?.ok && file && !commit.isPending && (
          <SheetPreview answer={answer} onSave={() => commit.mutate(file)} />
        )}
      </Stack>
    </Paper>
  );
}

function SheetProblems({ problems }: { problems: Extract<SheetUploadAnswer, { ok: false }>['problems'] }) {
  return (
    <Stack spacing={1}>
      <Alert severity="error">
        {problems.length} {problems.length === 1 ? 'problem' : 'problems'} in the sheet; nothing was saved. Fix them in the file and choose it again.
      </Alert>
      <TableContainer sx={{ maxHeight: 360 }}>
        <Table size="small" stickyHeader aria-label="Problems in the sheet">
          <TableHead>
            <TableRow>
              <TableCell>Row</TableCell>
              <TableCell>Column</TableCell>
              <TableCell>Problem</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {problems.map((p) => (
              <TableRow key={`${p.row}-${p.column}-${p.message}`}>
                <TableCell>{p.row || '–'}</TableCell>
                <TableCell>{p.column}</TableCell>
                <TableCell>{p.message}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
    </Stack>
  );
}

function SheetPreview({ answer, onSave }: { answer: Extract<SheetUploadAnswer, { ok: true }>; onSave(): void }) {
  return (
    <Stack spacing={1}>
      <Alert severity={answer.imported ? 'info' : 'success'} action={answer.imported > 0 && <Button variant="contained" onClick={onSave}>Save {answer.imported} {answer.imported === 1 ? 'result' : 'results'}</Button>}>
        Every row checks out: {answer.imported} to add or change, {answer.unchanged} already saved as in the sheet.
      </Alert>
      <TableContainer sx={{ maxHeight: 360 }}>
        <Table size="small" stickyHeader aria-label="Rows in the sheet">
          <TableHead>
            <TableRow>
              <TableCell>Row</TableCell>
              <TableCell>Event</TableCell>
              <TableCell>Athletes</TableCell>
              <TableCell>Club</TableCell>
              <TableCell align="right">Official</TableCell>
              <TableCell>Will be</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {answer.rows.slice(0, 500).map((r) => (
              <TableRow key={r.row}>
                <TableCell>{r.row}</TableCell>
                <TableCell>{r.event}</TableCell>
                <TableCell>{r.athletes}</TableCell>
                <TableCell>{r.club}</TableCell>
                <TableCell align="right">{r.officialHundredths === null ? (r.score ?? r.status.toLowerCase().replace(/_/g, ' ')) : formatTime(r.officialHundredths)}</TableCell>
                <TableCell>{ACTION_LABELS[r.action]}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
      {answer.rows.length > 500 && <Typography variant="body2">…and {answer.rows.length - 500} more rows.</Typography>}
    </Stack>
  );
}
