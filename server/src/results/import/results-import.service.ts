import { Inject, Injectable } from '@nestjs/common';
import { matchSheetRows, readResultSheet, type SheetError } from '@endgrain/shared';

import type { AuthUser } from '../../common/auth/auth-user.js';
import { DomainError } from '../../common/errors/domain-error.js';
import { LeagueRepository } from '../../league/league.repository.js';
import { MeetsRepository } from '../../meets/meets.repository.js';
import { POST_REFUSAL, TimekeepersService } from '../../meets/timekeepers.service.js';
import { ResultsReadRepository } from '../results-read.repository.js';
import { ResultsWriter } from '../results-writer.js';
import { ResultsRepository } from '../results.repository.js';
import { sheetChanges, type PreviewRow } from './sheet-changes.js';
import { sheetText, type UploadedSheet } from './sheet-text.js';

export type ImportOutcome =
  | { ok: true; imported: number; unchanged: number; dryRun: boolean; rows: PreviewRow[] }
  | { ok: false; errors: SheetError[] };

const IMPORTING = ['CLOSED', 'RUNNING'];

/**
 * A results sheet, all or nothing: every row is checked and matched first; any problem
 * returns every problem and saves nothing. A dry run stops after the checks.
 */
@Injectable()
export class ResultsImportService {
  constructor(
    @Inject(MeetsRepository) private readonly meetsRepo: MeetsRepository,
    @Inject(LeagueRepository) private readonly league: LeagueRepository,
    @Inject(ResultsRepository) private readonly repo: ResultsRepository,
    @Inject(ResultsReadRepository) private readonly read: ResultsReadRepository,
    @Inject(ResultsWriter) private readonly writer: ResultsWriter,
    @Inject(TimekeepersService) private readonly timekeepers: TimekeepersService,
  ) {}

  async import(actor: AuthUser, meetId: string, file: UploadedSheet | undefined, options: { dryRun: boolean }): Promise<ImportOutcome> {
    const meet = await this.meetsRepo.findMeet(meetId);
    if (!meet) throw DomainError.notFound('That meet');
    if (!(await this.timekeepers.canPost(actor, meetId))) throw DomainError.forbidden(POST_REFUSAL);
    const statusProblem = meet.status === 'PUBLISHED'
      ? 'these results are published; correct them one at a time, with a reason'
      : IMPORTING.includes(meet.status) ? null : 'results can be imported once the meet has closed its entries';
    if (statusProblem) return fileError(statusProblem);
    const text = sheetText(file);
    if (!text.ok) return fileError(text.message);
    const sheet = readResultSheet(text.text);
    if (!sheet.ok) return sheet;
    const [events, clubs, entries, existingRows] = await Promise.all([
      this.meetsRepo.eventsOf(meetId),
      this.league.clubs.find(),
      this.read.sheetEntries(meetId),
      this.read.resultsOfMeet(meetId),
    ]);
    const matched = matchSheetRows(sheet.rows, {
      events: events.map((e) => ({
        id: e.id, code: e.eventType.code, name: e.eventType.name, division: e.division, kind: e.eventType.resultKind, speciesId: e.speciesId, diameterMm: e.diameterMm,
      })),
      clubs,
      entries,
    });
    if (!matched.ok) return matched;
    const axes = await this.read.axesOfClubs([...new Set(matched.rows.filter((r) => r.axeLabel).map((r) => r.clubId))]);
    const { changes, preview } = sheetChanges(matched.rows, new Map(existingRows.map((r) => [r.entryId, r])), axes);
    if (options.dryRun) {
      const unchanged = preview.filter((p) => p.action === 'UNCHANGED').length;
      return { ok: true, imported: preview.length - unchanged, unchanged, dryRun: true, rows: preview };
    }
    const outcome = await this.repo.db.transaction(async (m) => {
      const locked = await this.repo.lockMeet(m, meetId);
      if (!locked || !IMPORTING.includes(locked.status)) throw DomainError.badInput('meetId', 'The meet changed status during the upload; try again.');
      return this.writer.write(m, locked, changes, { userId: actor.id, action: 'IMPORTED', reason: `sheet "${file?.originalname ?? ''}"`.slice(0, 300) });
    });
    return { ok: true, imported: outcome.written, unchanged: outcome.unchanged, dryRun: false, rows: preview };
  }
}

function fileError(message: string): ImportOutcome {
  return { ok: false, errors: [{ row: 0, column: 'file', message: `file: ${message}` }] };
}
