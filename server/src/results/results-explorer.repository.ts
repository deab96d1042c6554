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

  async search(filter: ExplorerFilter, sort: ExplorerSort, offset: number, limit: number): Promise<{ total: number; rows: ResultEntity[] }> {
    const base = this.filtered(filter);
    const column = SORT_COLUMN[sort.field];
    const [rows, total] = await Promise.all([
      base
        .clone()
        // Empty values (no time, no bevel recorded) go last whichever way the column sorts.
        .orderBy(`${column} IS NULL`, 'ASC')
        .addOrderBy(column, sort.direction)
        .addOrderBy('r.id', 'ASC')
        .offset(offset)
        .limit(limit)
        .getMany(),
      base.clone().getCount(),
    ]);
    return { total, rows };
  }

  /** Every matching row, for the CSV export, in pages so memory stays flat. */
  async *each(filter: ExplorerFilter, sort: ExplorerSort, batch = 2000): AsyncGenerator<ResultEntity[]> {
    for (let offset = 0; ; offset += batch) {
      const { rows } = await this.search(filter, sort, offset, batch);
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
    const inner = this.filtered({ ...filter, finishedOnly: true })
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

  private filtered(f: ExplorerFilter): SelectQueryBuilder<ResultEntity> {
    const q = this.db
      .getRepository(ResultEntity)
      .createQueryBuilder('r')
      .innerJoin(MeetEntity, 'm', 'm.id = r.meet_id AND m.status IN (:...visible)', { visible: VISIBLE_STATUSES });
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
