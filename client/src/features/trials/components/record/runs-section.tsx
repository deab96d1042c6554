import Add from '@mui/icons-material/Add';
import { depthPerSwing } from '@endgrain/shared';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';

import type { TrialAxeOption, UnitPreference } from '../../api/types.js';
import { formatDepth } from '../../lib/depth-format.js';
import type { DraftRun, DraftTester } from '../../lib/trial-draft.js';
import { keennessLabel, releaseLabel } from '../../lib/trial-words.js';

export interface RunsSectionProps {
  runs: DraftRun[];
  axes: TrialAxeOption[];
  testers: DraftTester[];
  referenceAxeId: string;
  units: UnitPreference;
  onAdd: () => void;
  onEdit: (run: DraftRun) => void;
  onRemove: (run: DraftRun) => void;
}

/** The axes swung so far, one card each, with a big button for the next. */
export function RunsSection({ runs, axes, testers, referenceAxeId, units, onAdd, onEdit, onRemove }: RunsSectionProps) {
  const [removing, setRemoving] = useState<string | null>(null);
  const axeName = (id: string) => axes.find((a) => a.id === id)?.label ?? 'Axe';
  const testerName = (id: string) => testers.find((t) => t.id === id)?.name ?? 'Tester';
  return (
    <Stack component="section" spacing={2} aria-labelledby="trial-runs-heading">
      <Typography id="trial-runs-heading" variant="h2" sx={{ fontSize: '1.35rem' }}>
        Axes on the block
      </Typography>
      {runs.length === 0 && (
        <Typography color="text.secondary">
          No axe swung yet. Start with the reference axe, then add each axe as it comes off the block.
        </Typography>
      )}
      <Stack component="ul" spacing={1.5} sx={{ p: 0, m: 0, listStyle: 'none' }} aria-label="Axes swung">
        {runs.map((run) => {
          const d = depthPerSwing(run.swings);
          const name = `${axeName(run.axeId)} · ${testerName(run.testerId)}`;
          return (
            <Paper component="li" key={run.id} variant="outlined" sx={{ p: 2 }} aria-label={name}>
              <Typography variant="subtitle1" component="h3">
                {name}
                {run.axeId === referenceAxeId && ' (reference)'}
              </Typography>
              <Typography variant="body2">
                {d.counted} counted{d.openingExcluded ? `, ${d.openingExcluded} opening` : ''}
                {d.meanMm !== null && ` · ${formatDepth(d.meanMm, units)} a swing`}
              </Typography>
              <Typography variant="body2" color="text.secondary">
                Release: {releaseLabel(run.releaseStep)} · Edge: {keennessLabel(run.keenness).toLowerCase()}
              </Typography>
              {removing === run.id ? (
                <Stack direction="row" spacing={1} sx={{ mt: 1 }} role="group" aria-label={`Remove ${name}?`}>
                  <Button color="error" variant="contained" onClick={() => onRemove(run)}>
                    Remove {d.counted + d.openingExcluded} swings
                  </Button>
                  <Button onClick={() => setRemoving(null)}>Keep</Button>
                </Stack>
              ) : (
                <Stack direction="row" spacing={1} sx={{ mt: 1 }}>
                  <Button variant="outlined" onClick={() => onEdit(run)} aria-label={`Edit ${name}`}>
                    Edit
                  </Button>
                  <Button color="error" onClick={() => setRemoving(run.id)} aria-label={`Remove ${name}`}>
                    Remove
                  </Button>
                </Stack>
              )}
            </Paper>
          );
        })}
      </Stack>
      <Button variant="contained" size="large" startIcon={<Add />} onClick={onAdd} sx={{ minHeight: 56 }} disabled={testers.length === 0}>
        Add an axe
      </Button>
      {testers.length === 0 && <Typography variant="body2" color="text.secondary">Add a tester under the block first.</Typography>}
    </Stack>
  );
}
