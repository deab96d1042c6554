import { officialTime, type MatchedSheetRow } from '@endgrain/shared';

import type { ResultEntity } from '../entities/result.entity.js';
import type { AxeSetup } from '../posted-from-input.js';
import { samePosted, type PostedResult } from '../posted-result.js';
import type { ResultChange } from '../results-writer.js';

export type PreviewAction = 'NEW' | 'CHANGED' | 'UNCHANGED';

export interface PreviewRow {
  row: number;
  event: string;
  division: string;
  club: string;
  athletes: string;
  status: string;
  officialHundredths: number | null;
  score: number | null;
  action: PreviewAction;
}

/**
 * Turns matched sheet rows into result changes. An axe label found in the club's rack links
 * the axe and fills the head columns the sheet left empty; a run-off order set in the results
 * table is kept, since the sheet has no column for it.
 */
export function sheetChanges(
  rows: readonly MatchedSheetRow[],
  existing: ReadonlyMap<string, ResultEntity>,
  axes: readonly AxeSetup[],
): { changes: ResultChange[]; preview: PreviewRow[] } {
  const rack = new Map(axes.map((a) => [`${a.clubId}|${a.label.toLowerCase()}`, a]));
  const changes: ResultChange[] = [];
  const preview: PreviewRow[] = [];
  for (const row of rows) {
    const axe = row.axeLabel ? rack.get(`${row.clubId}|${row.axeLabel.toLowerCase()}`) : undefined;
    const was = existing.get(row.entryId);
    const posted: PostedResult = {
      status: row.status,
      dqReason: row.reason,
      rawTimes: row.rawTimes,
      score: row.score,
      penaltyHundredths: Math.round(row.penaltySeconds * 100),
      runOffRank: was?.runOffRank ?? null,
      axeId: axe?.id ?? null,
      axeLabel: axe?.label ?? row.axeLabel,
      grind: row.grind ?? axe?.grind ?? null,
      bevelIncludedDeg: row.bevelIncludedDeg ?? axe?.bevelIncludedDeg ?? null,
      chiselWidthMm: row.chiselWidthMm === null ? (axe?.chiselWidthMm ?? null) : Math.round(row.chiselWidthMm * 100) / 100,
      speciesId: row.speciesId,
      diameterMm: row.diameterMm === null ? null : Math.round(row.diameterMm * 10) / 10,
      blockCondition: row.condition,
    };
    changes.push({ entry: { id: row.entryId, meetEventId: row.meetEventId, clubId: row.clubId }, posted });
    preview.push({
      row: row.row,
      event: row.event,
      division: row.division,
      club: row.club,
      athletes: row.athletes.join(' & '),
      status: row.status,
      officialHundredths: row.rawTimes.length ? officialTime(row.rawTimes).official : null,
      score: row.score,
      action: !was ? 'NEW' : samePosted(was, posted) ? 'UNCHANGED' : 'CHANGED',
    });
  }
  return { changes, preview };
}
