import { Inject, Injectable } from '@nestjs/common';
import { personalBests, speciesById } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { LeagueRepository } from '../league/league.repository.js';
import { canSeeAxe } from '../rack/rack-access.js';
import type { PageInput, RecordsFilter, ResultsFilter, ResultsSort } from './dto/result.inputs.js';
import type { ResultAuditModel, ResultModel, ResultsPageModel } from './models/result.model.js';
import type { AthleteResultsModel, ResultRecordModel } from './models/standings.model.js';
import { ResultHydrator } from './result-hydrator.js';
import { ResultsExplorerRepository, type ExplorerFilter, type ExplorerSort } from './results-explorer.repository.js';
import { ResultsReadRepository } from './results-read.repository.js';

export const MAX_PAGE_SIZE = 100;
/** An axe page lists at most this many of its latest results. */
export const AXE_RESULTS_LIMIT = 50;
const DEFAULT_SORT: ExplorerSort = { field: 'TIME', direction: 'ASC' };

/** Reading published results across clubs: the explorer, records, an athlete's results, the audit log. */
@Injectable()
export class ResultsBrowseService {
  constructor(
    @Inject(LeagueRepository) private readonly league: LeagueRepository,
    @Inject(ResultsReadRepository) private readonly read: ResultsReadRepository,
    @Inject(ResultsExplorerRepository) private readonly explorer: ResultsExplorerRepository,
    @Inject(ResultHydrator) private readonly hydrator: ResultHydrator,
  ) {}

  async search(filter: ResultsFilter | null, sort: ResultsSort | null, page: PageInput | null): Promise<ResultsPageModel> {
    const pageSize = page?.pageSize ?? 25;
    const index = page?.page ?? 0;
    if (!Number.isInteger(pageSize) || pageSize < 1 || pageSize > MAX_PAGE_SIZE) throw DomainError.badInput('pageSize', `A page holds 1 to ${MAX_PAGE_SIZE} results.`);
    if (!Number.isInteger(index) || index < 0) throw DomainError.badInput('page', 'Pages count from 0.');
    const { total, capped, rows } = await this.explorer.search(filter ?? {}, sort ?? DEFAULT_SORT, index * pageSize, pageSize);
    return { total, capped, page: index, pageSize, rows: await this.hydrator.models(rows) };
  }

  async *exportRows(filter: ExplorerFilter, sort: ExplorerSort | null): AsyncGenerator<ResultModel[]> {
    for await (const rows of this.explorer.each(filter, sort ?? DEFAULT_SORT)) yield this.hydrator.models(rows);
  }

  async records(filter: RecordsFilter | null): Promise<ResultRecordModel[]> {
    const rows = await this.hydrator.models(await this.explorer.records(filter ?? {}));
    return rows
      .map((result) => ({
        eventTypeId: result.eventTypeId,
        eventName: result.eventName,
        speciesId: result.speciesId,
        speciesName: result.speciesId ? (speciesById(result.speciesId)?.commonName ?? result.speciesId) : null,
        diameterMm: result.diameterMm,
        result,
      }))
      .sort((a, b) => a.eventName.localeCompare(b.eventName) || (a.speciesName ?? '').localeCompare(b.speciesName ?? '') || (a.diameterMm ?? 0) - (b.diameterMm ?? 0));
  }

  async athlete(athleteId: string): Promise<AthleteResultsModel> {
    const athlete = await this.league.athletes.findOne({ where: { id: athleteId }, relations: { club: true } });
    if (!athlete) throw DomainError.notFound('That athlete');
    const results = await this.hydrator.models(await this.read.athleteResults(athleteId));
    const bests = personalBests(results.map((r) => ({ ...r, kind: r.resultKind, result: r })));
    return {
      athleteId,
      name: `${athlete.firstName} ${athlete.lastName}`,
      clubId: athlete.clubId,
      clubName: athlete.club?.name ?? '',
      personalBests: bests.map((b) => ({ eventTypeId: b.eventTypeId, eventName: b.eventName, diameterMm: b.diameterMm, result: b.result })),
      results,
    };
  }

  /** An axe's latest published results, each with the head snapshot it was chopped with; seen by whoever may see the axe. */
  async axeResults(actor: AuthUser | null, axeId: string): Promise<ResultModel[]> {
    const axe = await this.read.findAxe(axeId);
    if (!axe || !canSeeAxe(actor, axe)) throw DomainError.notFound('That axe');
    return this.hydrator.models(await this.read.axeResults(axeId, AXE_RESULTS_LIMIT));
  }

  async audit(meetId: string): Promise<ResultAuditModel[]> {
    const rows = await this.read.auditOf(meetId);
    return rows.map((r) => ({
      id: r.id, resultId: r.resultId, entryId: r.entryId, action: r.action, reason: r.reason, byName: r.byName, at: r.createdAt,
      before: r.before === null ? null : JSON.stringify(r.before), after: JSON.stringify(r.after),
    }));
  }
}
