import { speciesById } from '@endgrain/shared';
import { useApolloClient } from '@apollo/client/react';
import ExpandMore from '@mui/icons-material/ExpandMore';
import Accordion from '@mui/material/Accordion';
import AccordionDetails from '@mui/material/AccordionDetails';
import AccordionSummary from '@mui/material/AccordionSummary';
import Alert from '@mui/material/Alert';
import Divider from '@mui/material/Divider';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useRef, useState } from 'react';

import { graphQLErrorDetails } from '../../../../lib/graphql-error-details.js';
import { trialsDocuments } from '../../api/trials-documents.js';
import type { TrialSetup, UnitPreference } from '../../api/types.js';
import { useTrialDraft } from '../../hooks/use-trial-draft.js';
import { draftToInput, lengthInMm } from '../../lib/draft-to-input.js';
import { formatDiameter } from '../../lib/depth-format.js';
import { newId } from '../../lib/new-id.js';
import { draftFromTrial, type DraftRun, type TrialDraft } from '../../lib/trial-draft.js';
import { conditionLabel } from '../../lib/trial-words.js';
import { TrialCautions } from '../trial-cautions.js';
import { BlockSection } from './block-section.js';
import { RunEditor } from './run-editor.js';
import { RunsSection } from './runs-section.js';
import { SyncStatus } from './sync-status.js';

export interface TrialRecorderProps {
  initial: TrialDraft;
  setup: TrialSetup;
  units: UnitPreference;
}

/** The phone screen beside the block: the block once, then one axe after another; kept on the phone and sent when it can be. */
export function TrialRecorder({ initial, setup, units }: TrialRecorderProps) {
  const { draft, online, update, sendNow, keepMine, replaceWith } = useTrialDraft(initial);
  const [editing, setEditing] = useState<{ run: DraftRun; isNew: boolean } | null>(null);
  const [conflictProblem, setConflictProblem] = useState<string>();
  const top = useRef<HTMLDivElement>(null);
  const client = useApolloClient();
  const check = draftToInput(draft);
  const problems = check.ok ? [] : check.problems;
  const [blockOpen, setBlockOpen] = useState(!check.ok);

  const serverCopy = async () => {
    setConflictProblem(undefined);
    try {
      const { data } = await client.query({ query: trialsDocuments.trial, variables: { id: draft.id }, fetchPolicy: 'network-only' });
      return data?.trial ?? null;
    } catch (error) {
      setConflictProblem(graphQLErrorDetails(error)[0]?.message);
      return null;
    }
  };
  const takeSaved = async () => {
    const trial = await serverCopy();
    if (trial) replaceWith(draftFromTrial(trial, { units, now: new Date().toISOString() }));
  };
  const keepLocal = async () => {
    const trial = await serverCopy();
    if (trial) keepMine(trial.version);
  };

  const startRun = () => {
    const lastTester = draft.runs[draft.runs.length - 1]?.testerId ?? draft.testers[0]?.id ?? '';
    // The reference axe goes on the block first; after that the recorder picks.
    const axeId = draft.runs.length === 0 ? draft.referenceAxeId : '';
    setEditing({ isNew: true, run: { id: newId(), axeId, testerId: lastTester, swings: [], releaseStep: null, keenness: null, feel: '', notes: '' } });
  };
  const saveRun = (run: DraftRun) => {
    const runs = editing?.isNew ? [...draft.runs, run] : draft.runs.map((r) => (r.id === run.id ? run : r));
    update({ runs });
    setEditing(null);
    // With an axe on the block the block is settled: fold it so the axes come first.
    setBlockOpen(false);
    top.current?.scrollIntoView?.({ block: 'start' });
  };

  return (
    <Stack ref={top} spacing={3} sx={{ maxWidth: 640, mx: 'auto', scrollMarginTop: 72 }}>
      <SyncStatus draft={draft} online={online} complete={check.ok} onSendNow={sendNow} onUseSaved={() => void takeSaved()} onKeepMine={() => void keepLocal()} />
      {conflictProblem && (
        <Alert severity="error" role="alert">
          {conflictProblem}
        </Alert>
      )}
      {editing ? (
        <Paper variant="outlined" sx={{ p: { xs: 2, sm: 3 } }}>
          <RunEditor
            run={editing.run}
            axes={setup.axes}
            testers={draft.testers}
            recordedAxeId={editing.isNew ? null : (initial.runs.find((r) => r.id === editing.run.id)?.axeId ?? null)}
            units={units}
            onSave={saveRun}
            onCancel={() => setEditing(null)}
          />
        </Paper>
      ) : (
        <>
          <Accordion expanded={blockOpen} onChange={(_e, open) => setBlockOpen(open)} variant="outlined" disableGutters slots={{ heading: 'h2' }}>
            <AccordionSummary expandIcon={<ExpandMore />}>
              <Typography sx={{ fontWeight: 600 }}>{blockOpen ? 'The block and testers' : blockSummary(draft, setup)}</Typography>
            </AccordionSummary>
            <AccordionDetails>
              <BlockSection draft={draft} setup={setup} problems={problems} onChange={update} />
            </AccordionDetails>
          </Accordion>
          <Paper variant="outlined" sx={{ p: { xs: 2, sm: 3 } }}>
            <RunsSection
              runs={draft.runs}
              axes={setup.axes}
              testers={draft.testers}
              referenceAxeId={draft.referenceAxeId}
              units={units}
              onAdd={startRun}
              onEdit={(run) => setEditing({ run, isNew: false })}
              onRemove={(run) => update({ runs: draft.runs.filter((r) => r.id !== run.id) })}
            />
          </Paper>
        </>
      )}
      <Divider />
      <TrialCautions />
    </Stack>
  );
}

/** The folded block in one line: "305 mm · Green / wet quaking aspen · 2 testers". */
function blockSummary(draft: TrialDraft, setup: TrialSetup): string {
  const mm = lengthInMm(draft.diameterText, draft.diameterUnit);
  const species = speciesById(draft.speciesId)?.commonName ?? 'species not set';
  const parts = [
    mm === null ? 'diameter not set' : formatDiameter(mm, draft.diameterUnit === 'in' ? 'IMPERIAL' : 'METRIC'),
    `${draft.condition ? conditionLabel(draft.condition) : 'condition not set'} ${species}`,
    `${draft.testers.length} tester${draft.testers.length === 1 ? '' : 's'}`,
    `reference ${setup.axes.find((a) => a.id === draft.referenceAxeId)?.label ?? 'not set'}`,
  ];
  return `The block: ${parts.join(' · ')}`;
}
