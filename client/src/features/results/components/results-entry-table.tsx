import { useMutation } from '@apollo/client/react';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useRef, useState, type KeyboardEvent } from 'react';

import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { MeetEventResults, RecordResultInput, UnitPreference } from '../api/types.js';
import { draftFieldFor, draftFrom, draftToInput, type DraftErrors, type EntryDraft } from '../lib/entry-draft.js';
import { CorrectionDialog } from './correction-dialog.js';
import { EntryRow } from './entry-row.js';

export interface ResultsEntryTableProps {
  event: MeetEventResults;
  units: UnitPreference;
  /** Published: each change is a correction with a reason. */
  published: boolean;
}

interface RowState {
  draft: EntryDraft;
  errors: DraftErrors;
  message?: string | undefined;
}

/**
 * Keyboard-first results entry for one meet event: Enter saves the row and moves to the same
 * cell of the next entry (Tab moves across); each row saves on its own and shows its own errors,
 * while place and points come back computed for the whole event.
 */
export function ResultsEntryTable({ event, units, published }: ResultsEntryTableProps) {
  const [rows, setRows] = useState<Record<string, RowState>>({});
  const [saving, setSaving] = useState<Set<string>>(new Set());
  const [correcting, setCorrecting] = useState<{ entryId: string; who: string; input: RecordResultInput } | null>(null);
  const container = useRef<HTMLDivElement>(null);
  const refetch = { refetchQueries: [{ query: resultsDocuments.meetResults, variables: { meetId: event.meetId } }] };
  const [record] = useMutation(resultsDocuments.recordResult, refetch);
  const [correct] = useMutation(resultsDocuments.correctResult, refetch);

  const entries = [
    ...event.results.map((r) => ({ id: r.entryId, label: r.label, clubId: r.clubId, clubShortName: r.clubShortName })),
    ...event.waiting.map((e) => ({ id: e.id, label: e.label, clubId: e.clubId, clubShortName: e.clubShortName })),
  ].sort((a, b) => a.label.localeCompare(b.label));
  const resultOf = (entryId: string) => event.results.find((r) => r.entryId === entryId);
  const stateOf = (entryId: string): RowState => rows[entryId] ?? { draft: draftFrom(resultOf(entryId), units), errors: {} };
  const update = (entryId: string, next: RowState | null) =>
    setRows((current) => {
      const copy = { ...current };
      if (next) copy[entryId] = next;
      else delete copy[entryId];
      return copy;
    });

  const send = async (entryId: string, input: RecordResultInput, reason: string | null) => {
    const draft = stateOf(entryId).draft;
    setSaving((s) => new Set(s).add(entryId));
    try {
      if (reason === null) await record({ variables: { input } });
      else await correct({ variables: { input: { ...input, correctionReason: reason } } });
      // Saved: the row shows the server's values again, unless it was edited meanwhile.
      setRows((current) => {
        if (current[entryId]?.draft !== draft) return current;
        const copy = { ...current };
        delete copy[entryId];
        return copy;
      });
    } catch (error) {
      const details = graphQLErrorDetails(error);
      const errors: DraftErrors = {};
      for (const detail of details) errors[draftFieldFor(detail.field)] = detail.message;
      update(entryId, { draft, errors, message: details.map((d) => d.message).join(' ') });
    } finally {
      setSaving((s) => {
        const copy = new Set(s);
        copy.delete(entryId);
        return copy;
      });
    }
  };

  const save = (entryId: string, who: string) => {
    const state = stateOf(entryId);
    const checked = draftToInput(entryId, state.draft, event, units);
    if (!checked.ok) {
      update(entryId, { draft: state.draft, errors: checked.errors, message: 'Fix the marked cells, then save again.' });
      return;
    }
    if (published) setCorrecting({ entryId, who, input: checked.input });
    else void send(entryId, checked.input, null);
  };

  const onKeyDown = (keyEvent: KeyboardEvent<HTMLDivElement>) => {
    const target = keyEvent.target as HTMLElement;
    if (keyEvent.key !== 'Enter' || target.tagName === 'BUTTON' || !target.dataset['row']) return;
    keyEvent.preventDefault();
    const row = Number(target.dataset['row']);
    const entry = entries[row];
    if (!entry) return;
    if (rows[entry.id]) save(entry.id, entry.label);
    const next = container.current?.querySelector<HTMLElement>(`[data-row="${row + 1}"][data-column="${target.dataset['column']}"]`);
    next?.focus();
  };

  if (entries.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>No entries in this event. Clubs enter their athletes from the meet page while entries are open.</Typography>;
  }
  return (
    <Stack spacing={1.5} ref={container} onKeyDown={onKeyDown}>
      {entries.map((entry, index) => {
        const state = stateOf(entry.id);
        return (
          <EntryRow
            key={entry.id}
            row={index}
            entry={entry}
            event={event}
            result={resultOf(entry.id)}
            draft={state.draft}
            dirty={Boolean(rows[entry.id])}
            saving={saving.has(entry.id)}
            errors={state.errors}
            message={state.message}
            units={units}
            onDraft={(draft) => update(entry.id, { draft, errors: {} })}
            onSave={() => save(entry.id, entry.label)}
          />
        );
      })}
      <CorrectionDialog
        key={correcting?.entryId ?? 'none'}
        who={correcting?.who ?? null}
        onCancel={() => setCorrecting(null)}
        onConfirm={(reason) => {
          if (correcting) void send(correcting.entryId, correcting.input, reason);
          setCorrecting(null);
        }}
      />
    </Stack>
  );
}
