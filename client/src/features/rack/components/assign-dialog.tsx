import { useMutation, useQuery } from '@apollo/client/react';
import { EXPERIENCE_LABELS } from '@endgrain/shared';
import TextField from '@mui/material/TextField';
import MenuItem from '@mui/material/MenuItem';
import Typography from '@mui/material/Typography';
import { useState, type FormEvent } from 'react';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { rackDocuments } from '../api/rack-documents.js';
import type { Axe, ExperienceLevel, LineupEntry } from '../api/types.js';
import { OUT_OF_USE, STATUS_LABELS, USE_LABELS } from '../lib/rack-labels.js';
import { FormDialog } from '../../../components/ui/form-dialog.js';

const RANK: Record<ExperienceLevel, number> = { ROOKIE: 0, DEVELOPING: 1, EXPERIENCED: 2 };
const LEAST: Record<Axe['allowedFor'], number> = { ANYONE: 0, DEVELOPING_UP: 1, EXPERIENCED_ONLY: 2 };

export interface AssignDialogProps {
  clubId: string;
  entry: LineupEntry;
  onClose: () => void;
  /** Called with the server's warnings once the assignment is saved. */
  onAssigned: (warnings: string[]) => void;
}

/** Picks the athlete and the axe for one entry; the server's rules decide, and their words are shown. */
export function AssignDialog({ clubId, entry, onClose, onAssigned }: AssignDialogProps) {
  const rack = useQuery(rackDocuments.rack, { variables: { clubId, filter: null } });
  const [assign, { loading }] = useMutation(rackDocuments.assignLineup, { refetchQueries: [rackDocuments.lineup, rackDocuments.lineupOverrides], awaitRefetchQueries: true });
  const [athleteId, setAthleteId] = useState(entry.assignment?.athleteId ?? entry.athletes[0]?.id ?? '');
  const [axeId, setAxeId] = useState(entry.assignment?.axeId ?? '');
  const [reason, setReason] = useState('');
  const [errors, setErrors] = useState<{ field?: string; message: string }[]>([]);
  const axes = rack.data?.rack.axes ?? [];
  const athlete = entry.athletes.find((a) => a.id === athleteId);
  const axe = axes.find((a) => a.id === axeId);
  // Shown before the server asks, so the coach sees the rule while choosing.
  const needsOverride = Boolean(athlete && axe && RANK[athlete.experience] < LEAST[axe.allowedFor]);
  const errorFor = (field: string) => errors.find((e) => e.field === field)?.message;
  const askReason = needsOverride || Boolean(errorFor('overrideReason'));

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setErrors([]);
    try {
      const result = await assign({ variables: { input: { entryId: entry.entryId, athleteId: athleteId || null, axeId: axeId || null, overrideReason: askReason ? reason : null } } });
      onAssigned(result.data?.assignLineup.warnings ?? []);
    } catch (error) {
      setErrors(graphQLErrorDetails(error));
    }
  };
  const other = errors.filter((e) => !['athleteId', 'axeId', 'overrideReason'].includes(e.field ?? '')).map((e) => e.message).join(' ');

  return (
    <FormDialog fullScreenOnPhone title={`Lineup: ${entry.eventName}`} onClose={onClose} onSubmit={(event) => void submit(event)} submitLabel="Save" submitting={loading}>
      <FormAlert message={other || undefined} />
      <TextField select label="Athlete" value={athleteId} onChange={(event) => setAthleteId(event.target.value)} error={Boolean(errorFor('athleteId'))} helperText={errorFor('athleteId') ?? ' '}>
        {entry.athletes.map((a) => (
          <MenuItem key={a.id} value={a.id}>
            {a.name} ({EXPERIENCE_LABELS[a.experience]})
          </MenuItem>
        ))}
      </TextField>
      {entry.usesHead ? (
        <TextField select label="Axe" value={axeId} onChange={(event) => setAxeId(event.target.value)} error={Boolean(errorFor('axeId'))} helperText={errorFor('axeId') ?? (axe ? `${STATUS_LABELS[axe.status]} · ${USE_LABELS[axe.allowedFor]}` : 'Head loose, needs handle and retired axes stay out of use')}>
          <MenuItem value="">No axe yet</MenuItem>
          {axes.map((a) => (
            <MenuItem key={a.id} value={a.id} disabled={OUT_OF_USE.has(a.status)}>
              {a.label} · {STATUS_LABELS[a.status]} · {USE_LABELS[a.allowedFor]}
            </MenuItem>
          ))}
        </TextField>
      ) : (
        <Typography sx={{ color: 'text.secondary' }}>This event is not chopped with an axe head, so no axe is assigned.</Typography>
      )}
      {askReason && (
        <TextField
          label="Reason for the override"
          multiline
          minRows={2}
          value={reason}
          onChange={(event) => setReason(event.target.value)}
          error={Boolean(errorFor('overrideReason'))}
          helperText={errorFor('overrideReason') ?? `${axe?.label ?? 'This axe'} is for ${axe ? USE_LABELS[axe.allowedFor].toLowerCase() : 'more experienced athletes'}. Say why ${athlete?.name ?? 'this athlete'} may swing it; the reason is recorded with your name.`}
          slotProps={{ htmlInput: { maxLength: 300 } }}
        />
      )}
    </FormDialog>
  );
}
