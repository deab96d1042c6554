import { useMutation, useQuery } from '@apollo/client/react';
import ArrowDownwardIcon from '@mui/icons-material/ArrowDownward';
import ArrowUpwardIcon from '@mui/icons-material/ArrowUpward';
import DeleteIcon from '@mui/icons-material/Delete';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';

import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { fieldNotesDocuments as docs } from '../api/field-notes-documents.js';
import type { FieldNote, FirstCuts } from '../api/types.js';

/** Admins order the series: move steps up and down, take them out, add published guides and safety notes. */
export function FirstCutsCurator({ series, onDone }: { series: FirstCuts; onDone: () => void }) {
  const [steps, setSteps] = useState<FieldNote[]>(series.steps.map((s) => s.note));
  const [adding, setAdding] = useState('');
  const [problem, setProblem] = useState<string>();
  const guides = useQuery(docs.fieldNotes, { variables: { filter: { kind: 'GUIDE', limit: 100 } } });
  const safety = useQuery(docs.fieldNotes, { variables: { filter: { kind: 'SAFETY_NOTE', limit: 100 } } });
  const [save, { loading }] = useMutation(docs.setFirstCuts, { refetchQueries: [docs.firstCuts], awaitRefetchQueries: true });
  const candidates = [...(safety.data?.fieldNotes ?? []), ...(guides.data?.fieldNotes ?? [])].filter((n) => !steps.some((s) => s.id === n.id));

  const move = (i: number, by: number) => {
    const next = [...steps];
    const [step] = next.splice(i, 1);
    if (step) next.splice(i + by, 0, step);
    setSteps(next);
  };
  const commit = async () => {
    setProblem(undefined);
    try {
      await save({ variables: { noteIds: steps.map((s) => s.id) } });
      onDone();
    } catch (error) {
      setProblem(graphQLErrorDetails(error).map((d) => d.message).join(' '));
    }
  };

  return (
    <Stack spacing={2}>
      <Paper variant="outlined">
        <List component="ol" aria-label="Series order">
          {steps.map((note, i) => (
            <ListItem
              key={note.id}
              divider
              secondaryAction={
                <Stack direction="row">
                  <IconButton aria-label={`Move ${note.title} up`} disabled={i === 0} onClick={() => move(i, -1)}>
                    <ArrowUpwardIcon />
                  </IconButton>
                  <IconButton aria-label={`Move ${note.title} down`} disabled={i === steps.length - 1} onClick={() => move(i, 1)}>
                    <ArrowDownwardIcon />
                  </IconButton>
                  <IconButton aria-label={`Take ${note.title} out of the series`} onClick={() => setSteps(steps.filter((s) => s.id !== note.id))}>
                    <DeleteIcon />
                  </IconButton>
                </Stack>
              }
              sx={{ pr: 18 }}
            >
              <ListItemText primary={`${i + 1}. ${note.title}`} />
            </ListItem>
          ))}
        </List>
      </Paper>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5} sx={{ alignItems: { sm: 'center' } }}>
        <TextField select label="Add a published guide or safety note" value={adding} onChange={(e) => setAdding(e.target.value)} sx={{ minWidth: 320 }} disabled={candidates.length === 0} helperText={candidates.length === 0 ? 'Every published guide and safety note is already in the series.' : undefined}>
          {candidates.map((n) => (
            <MenuItem key={n.id} value={n.id}>
              {n.title}
            </MenuItem>
          ))}
        </TextField>
        <Button
          disabled={!adding}
          onClick={() => {
            const note = candidates.find((n) => n.id === adding);
            if (note) setSteps([...steps, note]);
            setAdding('');
          }}
        >
          Add to the end
        </Button>
      </Stack>
      {problem && <Alert severity="error" role="alert">{problem}</Alert>}
      <Stack direction="row" spacing={1.5}>
        <Button variant="contained" onClick={() => void commit()} loading={loading}>
          Save the order
        </Button>
        <Button onClick={onDone}>Cancel</Button>
      </Stack>
    </Stack>
  );
}
