import { Inject, Injectable } from '@nestjs/common';
import { DataSource, type SelectQueryBuilder } from 'typeorm';

import { EventTypeEntity } from '../meets/entities/event-type.entity.js';
import { MeetEntity } from '../meets/entities/meet.entity.js';
import { ResultEntity } from './entities/result.entity.js';
import { VISIBLE_STATUSES } from './results-read.repository.js';

export interface ExplorerFilter {
  seasonId?: string | null;
  meetId?: string | null;
  clubId?: string | null;
  eventTypeId?: string | null;
  division?: string | null;
  speciesId?: string | null;
  diameterMinMm?: number | null;
  diameterMaxMm?: number | null;
  grind?: string | null;
  bevelMinDeg?: number | null;
  bevelMaxDeg?: number | null;
  condition?: string | null;
  finishedOnly?: boolean | null;
}

export type ExplorerSortField = 'TIME' | 'SCORE' | 'PLACE' | 'POINTS' | 'DATE' | 'DIAMETER' | 'BEVEL';
export interface ExplorerSort {
  field: ExplorerSortField;
  direction: 'ASC' | 'DESC';
}

/** Counting stops here; a filter matching more says so instead of counting on. */
export const COUNT_CAP = 10_000;

const SORT_COLUMN: Record<ExplorerSortField, string> = {
  TIME: 'r.total_hundredths',
  SCORE: 'r.score',
  PLACE: 'r.place',
  POINTS: 'r.points',
  DATE: 'r.meet_date',
  DIAMETER: 'r.diameter_mm',
  BEVEL: 'r.bevel_included_deg',
};

/** The results explorer: published results across every club, filtered and sorted in SQL. */
@Injectable()
export class ResultsExplorerRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  /**
   * One page of results. Sorting follows an index (the column, then the id, in the same
   * direction), and rows with an empty sort value come after the rest whichever the direction.
   * The count stops at COUNT_CAP: counting every row of a broad filter costs more than the page.
   */
  async search(filter: ExplorerFilter, sort: ExplorerSort, offset: number, limit: number): Promise<{ total: number; capped: boolean; rows: ResultEntity[] }> {
    const hidden = await this.hiddenMeetIds();
    const [rows, count] = await Promise.all([this.page(filter, hidden, sort, offset, limit), this.count(filter, hidden)]);
    return { ...count, rows };
  }

  private async page(filter: ExplorerFilter, hidden: readonly string[], sort: ExplorerSort, offset: number, limit: number): Promise<ResultEntity[]> {
    const column = SORT_COLUMN[sort.field];
    const ordered = (q: SelectQueryBuilder<ResultEntity>, by: string, direction: 'ASC' | 'DESC') =>
      q.orderBy(by, direction).addOrderBy('r.id', direction);
    const filled = await ordered(this.filtered(filter, hidden).andWhere(`${column} IS NOT NULL`), column, sort.direction).offset(offset).limit(limit).getMany();
    if (filled.length === limit) return filled;
    const valued = filled.length > 0 || offset === 0 ? offset + filled.length : await this.filtered(filter, hidden).andWhere(`${column} IS NOT NULL`).getCount();
    const empty = await ordered(this.filtered(filter, hidden).andWhere(`${column} IS NULL`), 'r.id', 'ASC')
      .offset(Math.max(0, offset - valued))
      .limit(limit - filled.length)
      .getMany();
    return [...filled, ...empty];
  }

  /** Meets with results that visitors may not read yet (being run or taken back): few at a time. */
  private async hiddenMeetIds(): Promise<string[]> {
    const rows = await this.db.query<{ id: string }[]>(
      'SELECT m.id FROM meets m WHERE m.status NOT IN (?) AND EXISTS (SELECT 1 FROM results r WHERE r.meet_id = m.id)',
      [VISIBLE_STATUSES],
    );
    return rows.map((r) => r.id);
  }

  /** Matching rows up to the cap, less those of hidden meets (read through the meet index). */
  private async count(filter: ExplorerFilter, hidden: readonly string[]): Promise<{ total: number; capped: boolean }> {
    const [sql, parameters] = this.filtered(filter, []).select('1').limit(COUNT_CAP + 1).getQueryAndParameters();
    const counted = await this.db.query<{ n: string }[]>(`SELECT COUNT(*) AS n FROM (${sql}) capped`, parameters);
    const reached = Number(counted[0]?.n ?? 0);
    if (reached > COUNT_CAP) return { total: COUNT_CAP, capped: true };
    if (hidden.length === 0) return { total: reached, capped: false };
    const inHidden = await this.filtered(filter, []).andWhere('r.meet_id IN (:...hidden)', { hidden }).getCount();
    return { total: reached - inHidden, capped: false };
  }

  /** Every matching row, for the CSV export, in pages so memory stays flat. */
  async *each(filter: ExplorerFilter, sort: ExplorerSort, batch = 2000): AsyncGenerator<ResultEntity[]> {
    const hidden = await this.hiddenMeetIds();
    for (let offset = 0; ; offset += batch) {
      const rows = await this.page(filter, hidden, sort, offset, batch);
      if (rows.length === 0) return;
      yield rows;
      if (rows.length < batch) return;
    }
  }

  /**
   * The best finished result per event type, species and diameter: lowest total for timed
   * events, highest score (then time) for scored ones, fewest hits (then time) otherwise; an
   * earlier result keeps a record it shares.
   */
  records(filter: Pick<ExplorerFilter, 'seasonId' | 'eventTypeId' | 'speciesId' | 'division'>): Promise<ResultEntity[]> {
    const inner = this.filtered({ ...filter, finishedOnly: true }, [])
      .innerJoin(MeetEntity, 'm', 'm.id = r.meet_id AND m.status IN (:...visible)', { visible: VISIBLE_STATUSES })
      .innerJoin(EventTypeEntity, 'et', 'et.id = r.event_type_id')
      .andWhere('r.place IS NOT NULL')
      .select('r.id', 'id')
      .addSelect(
        `ROW_NUMBER() OVER (PARTITION BY r.event_type_id, r.species_id, r.diameter_mm ORDER BY
          CASE et.result_kind WHEN 'SCORED' THEN -r.score WHEN 'FEWEST_HITS' THEN r.score ELSE 0 END,
          COALESCE(r.total_hundredths, 4294967295), r.meet_date, r.id)`,
        'rn',
      );
    return this.db
      .getRepository(ResultEntity)
      .createQueryBuilder('best')
      .innerJoin(`(${inner.getQuery()})`, 'ranked', 'ranked.id = best.id AND ranked.rn = 1')
      .setParameters(inner.getParameters())
      .orderBy('best.event_type_id')
      .addOrderBy('best.species_id')
      .addOrderBy('best.diameter_mm')
      .getMany();
  }

  private filtered(f: ExplorerFilter, hidden: readonly string[]): SelectQueryBuilder<ResultEntity> {
    const q = this.db.getRepository(ResultEntity).createQueryBuilder('r');
    if (hidden.length) q.andWhere('r.meet_id NOT IN (:...hidden)', { hidden });
    const equal: [keyof ExplorerFilter, string][] = [
      ['seasonId', 'r.season_id'], ['meetId', 'r.meet_id'], ['clubId', 'r.club_id'], ['eventTypeId', 'r.event_type_id'],
      ['division', 'r.division'], ['speciesId', 'r.species_id'], ['grind', 'r.grind'], ['condition', 'r.block_condition'],
    ];
    for (const [key, column] of equal) {
      if (f[key] !== null && f[key] !== undefined && f[key] !== '') q.andWhere(`${column} = :${key}`, { [key]: f[key] });
    }
    const ranges: [keyof ExplorerFilter, string, string][] = [
      ['diameterMinMm', 'r.diameter_mm', '>='], ['diameterMaxMm', 'r.diameter_mm', '<='],
      ['bevelMinDeg', 'r.bevel_included_deg', '>='], ['bevelMaxDeg', 'r.bevel_included_deg', '<='],
    ];
    for (const [key, column, op] of ranges) {
      if (typeof f[key] === 'number') q.andWhere(`${column} ${op} :${key}`, { [key]: f[key] });
    }
    if (f.finishedOnly) q.andWhere("r.final_status = 'FINISHED'");
    return q;
  }
}
