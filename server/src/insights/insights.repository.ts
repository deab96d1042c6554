import { Inject, Injectable } from '@nestjs/common';
import { BEVEL_BANDS, CHISEL_BANDS, type HeadBand } from '@endgrain/shared';
import { DataSource } from 'typeorm';

import { HandicapMarkEntity } from './entities/handicap-mark.entity.js';
import type { GrainMapFilter } from './dto/grain-map.filter.js';
import { toDb, toId, type RaceRow, type RowsStamp, type TrialRow } from './insights-rows.js';

const VISIBLE = "m.status IN ('PUBLISHED','ARCHIVED')";

interface RawRace {
  id: string; athlete_id: string; athlete_name: string; club_id: string; meet_name: string; meet_date: string | Date;
  species_id: string; block_condition: string | null; diameter_mm: string; total_hundredths: number;
  grind: string | null; bevel_included_deg: string | null; chisel_width_mm: string | null;
}

/** Plain SQL reads behind the Grain Map and handicap marks; a narrow projection, statistics happen in Node. */
@Injectable()
export class InsightsRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  private trialsTable: Promise<boolean> | null = null;

  /** Trials land in their own migration; until it has run, the map shows race times only. */
  private hasTrials(): Promise<boolean> {
    this.trialsTable ??= this.db
      .query("SELECT COUNT(*) AS n FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name = 'trial_summaries'")
      .then((rows: { n: string | number }[]) => Number(rows[0]?.n) > 0);
    return this.trialsTable;
  }

  eventType(id: string): Promise<{ id: string; code: string; name: string; team_size: number; result_kind: string } | undefined> {
    return this.db.query('SELECT id, code, name, team_size, result_kind FROM event_types WHERE id = ?', [id]).then((rows: never[]) => rows[0]);
  }

  /** Finished, published single-athlete results of one event with a block recorded. */
  async raceRows(filter: GrainMapFilter, eventCode: string): Promise<RaceRow[]> {
    const { where, params } = raceWhere(filter);
    const rows: RawRace[] = await this.db.query(
      `SELECT r.id, ea.athlete_id, CONCAT(a.first_name, ' ', a.last_name) AS athlete_name, r.club_id, m.name AS meet_name, r.meet_date,
              r.species_id, r.block_condition, r.diameter_mm, r.total_hundredths, r.grind, r.bevel_included_deg, r.chisel_width_mm
       FROM results r
       JOIN meets m ON m.id = r.meet_id AND ${VISIBLE}
       JOIN entry_athletes ea ON ea.entry_id = r.entry_id
       JOIN athletes a ON a.id = ea.athlete_id
       WHERE ${where}`,
      params,
    );
    return rows.map((row) => ({
      resultId: row.id,
      athleteId: row.athlete_id,
      athleteName: row.athlete_name,
      clubId: row.club_id,
      meetName: row.meet_name,
      meetDate: isoDate(row.meet_date),
      eventType: eventCode,
      speciesId: row.species_id,
      condition: row.block_condition === null ? null : toId(row.block_condition),
      diameterMm: Number(row.diameter_mm),
      hundredths: Number(row.total_hundredths),
      head:
        row.grind === null
          ? null
          : { grind: toId(row.grind), includedDeg: numberOrNull(row.bevel_included_deg), chiselWidthMm: numberOrNull(row.chisel_width_mm) },
    }));
  }

  /** Cheap enough to run on every request: count and newest change of the rows a matrix reads. */
  async stamp(filter: GrainMapFilter): Promise<RowsStamp> {
    const params: unknown[] = [filter.eventTypeId];
    let where = 'event_type_id = ?';
    if (filter.division) {
      where += ' AND division = ?';
      params.push(filter.division);
    }
    const noTrials = Promise.resolve([{ n: 0, newest: null }]);
    const [[results], [meets], [trials]] = await Promise.all([
      this.db.query(`SELECT COUNT(*) AS n, MAX(updated_at) AS newest FROM results WHERE ${where}`, params),
      this.db.query('SELECT MAX(updated_at) AS newest FROM meets'),
      (await this.hasTrials()) ? this.db.query('SELECT COUNT(*) AS n, MAX(updated_at) AS newest FROM trials') : noTrials,
    ]);
    return {
      results: Number(results.n),
      newestResult: stampText(results.newest),
      newestMeet: stampText(meets.newest),
      trials: Number(trials.n),
      newestTrial: stampText(trials.newest),
    };
  }

  /** Trials published as a finding (a club's unpublished tests stay its own), with each run's head. */
  async trialRows(filter: GrainMapFilter): Promise<TrialRow[]> {
    if (!(await this.hasTrials())) return [];
    const params: unknown[] = [];
    let where = 'EXISTS (SELECT 1 FROM trial_summaries s WHERE s.trial_id = t.id)';
    if (filter.clubIds?.length) {
      where += ` AND t.club_id IN (${filter.clubIds.map(() => '?').join(',')})`;
      params.push(...filter.clubIds);
    }
    if (filter.condition) {
      where += ' AND t.block_condition = ?';
      params.push(toDb(filter.condition));
    }
    const rows: {
      trial_id: string; club_id: string; tested_on: string | Date; species_id: string; block_condition: string; diameter_mm: string;
      reference_axe_id: string; axe_id: string; axe_label: string | null; tester_id: string; swings: unknown; release_step: number | null;
      keenness: string | null; grind: string; bevel_included_deg: string | null; chisel_width_mm: string | null;
    }[] = await this.db.query(
      `SELECT t.id AS trial_id, t.club_id, t.tested_on, t.species_id, t.block_condition, t.diameter_mm, t.reference_axe_id,
              tr.axe_id, ax.label AS axe_label, tr.tester_id, tr.swings, tr.release_step, tr.keenness, tr.grind, tr.bevel_included_deg, tr.chisel_width_mm
       FROM trials t JOIN trial_runs tr ON tr.trial_id = t.id LEFT JOIN axes ax ON ax.id = tr.axe_id
       WHERE ${where} ORDER BY t.id, tr.position`,
      params,
    );
    const trials = new Map<string, TrialRow>();
    for (const row of rows) {
      const trial = trials.get(row.trial_id) ?? {
        trialId: row.trial_id,
        clubId: row.club_id,
        testedOn: isoDate(row.tested_on),
        speciesId: row.species_id,
        condition: toId(row.block_condition),
        diameterMm: Number(row.diameter_mm),
        referenceAxeId: row.reference_axe_id,
        runs: [],
      };
      const swings = typeof row.swings === 'string' ? JSON.parse(row.swings) : row.swings;
      trial.runs.push({
        axeId: row.axe_id,
        axeLabel: row.axe_label ?? row.axe_id,
        testerId: row.tester_id,
        swings: swings as TrialRow['runs'][number]['swings'],
        release: row.release_step === null ? null : (`release-${row.release_step}` as TrialRow['runs'][number]['release']),
        keenness: row.keenness === null ? null : (toId(row.keenness) as TrialRow['runs'][number]['keenness']),
        head: { grind: toId(row.grind), includedDeg: numberOrNull(row.bevel_included_deg), chiselWidthMm: numberOrNull(row.chisel_width_mm) },
      });
      trials.set(row.trial_id, trial);
    }
    return [...trials.values()];
  }

  meetEvent(id: string): Promise<{ id: string; meet_id: string; meet_name: string; starts_on: string | Date; event_type_id: string; event_name: string; event_code: string; division: string; diameter_mm: string | null } | undefined> {
    return this.db
      .query(
        `SELECT me.id, me.meet_id, m.name AS meet_name, m.starts_on, me.event_type_id, et.name AS event_name, et.code AS event_code, me.division, me.diameter_mm
         FROM meet_events me JOIN meets m ON m.id = me.meet_id JOIN event_types et ON et.id = me.event_type_id WHERE me.id = ?`,
        [id],
      )
      .then((rows: never[]) => rows[0]);
  }

  enteredAthletes(meetEventId: string): Promise<{ athlete_id: string; name: string; club_id: string }[]> {
    return this.db.query(
      `SELECT ea.athlete_id, CONCAT(a.first_name, ' ', a.last_name) AS name, a.club_id
       FROM entry_athletes ea JOIN athletes a ON a.id = ea.athlete_id WHERE ea.meet_event_id = ? ORDER BY a.last_name, a.first_name, a.id`,
      [meetEventId],
    );
  }

  /** Finished published times in this event before the meet, newest first. */
  history(athleteIds: readonly string[], eventTypeId: string, before: string): Promise<{ athlete_id: string; total_hundredths: number; diameter_mm: string; meet_date: string | Date; meet_name: string }[]> {
    if (athleteIds.length === 0) return Promise.resolve([]);
    return this.db.query(
      `SELECT ea.athlete_id, r.total_hundredths, r.diameter_mm, r.meet_date, m.name AS meet_name
       FROM results r JOIN meets m ON m.id = r.meet_id AND ${VISIBLE} JOIN entry_athletes ea ON ea.entry_id = r.entry_id
       WHERE ea.athlete_id IN (${athleteIds.map(() => '?').join(',')}) AND r.event_type_id = ? AND r.meet_date < ?
         AND r.final_status = 'FINISHED' AND r.total_hundredths IS NOT NULL AND r.diameter_mm > 0
       ORDER BY r.meet_date DESC, r.id`,
      [...athleteIds, eventTypeId, before],
    );
  }

  overrides(meetEventId: string): Promise<HandicapMarkEntity[]> {
    return this.db.getRepository(HandicapMarkEntity).find({ where: { meetEventId } });
  }

  async saveOverrides(meetEventId: string, userId: string, marks: readonly { athleteId: string; markSeconds: number | null; note: string }[]): Promise<void> {
    await this.db.transaction(async (m) => {
      const repo = m.getRepository(HandicapMarkEntity);
      for (const mark of marks) {
        if (mark.markSeconds === null) await repo.delete({ meetEventId, athleteId: mark.athleteId });
        else await repo.save({ meetEventId, athleteId: mark.athleteId, markSeconds: mark.markSeconds, note: mark.note, setBy: userId });
      }
    });
  }
}

function raceWhere(filter: GrainMapFilter): { where: string; params: unknown[] } {
  const clauses = ["r.event_type_id = ?", "r.final_status = 'FINISHED'", 'r.total_hundredths IS NOT NULL', 'r.species_id IS NOT NULL', 'r.diameter_mm > 0'];
  const params: unknown[] = [filter.eventTypeId];
  const add = (clause: string, ...values: unknown[]) => {
    clauses.push(clause);
    params.push(...values);
  };
  if (filter.division) add('r.division = ?', filter.division);
  if (filter.seasonIds?.length) add(`r.season_id IN (${filter.seasonIds.map(() => '?').join(',')})`, ...filter.seasonIds);
  if (filter.clubIds?.length) add(`r.club_id IN (${filter.clubIds.map(() => '?').join(',')})`, ...filter.clubIds);
  if (filter.condition) add('r.block_condition = ?', toDb(filter.condition));
  if (filter.diameterMinMm != null) add('r.diameter_mm >= ?', filter.diameterMinMm);
  if (filter.diameterMaxMm != null) add('r.diameter_mm <= ?', filter.diameterMaxMm);
  if (filter.bevelBand) bandClause(BEVEL_BANDS, filter.bevelBand, 'r.bevel_included_deg', add);
  if (filter.chiselBand) bandClause(CHISEL_BANDS, filter.chiselBand, 'r.chisel_width_mm', add);
  return { where: clauses.join(' AND '), params };
}

/** The same lower-inclusive bounds as the shared band functions. */
function bandClause(bands: readonly HeadBand[], id: string, column: string, add: (clause: string, ...values: unknown[]) => void): void {
  const band = bands.find((b) => b.id === id);
  if (band === undefined) {
    add('1 = 0');
    return;
  }
  add(`${column} IS NOT NULL`);
  if (band.min !== null) add(`${column} >= ?`, band.min);
  if (band.max !== null) add(`${column} < ?`, band.max);
}

export function isoDate(value: string | Date): string {
  return value instanceof Date ? value.toISOString().slice(0, 10) : String(value).slice(0, 10);
}

function numberOrNull(value: string | null): number | null {
  return value === null ? null : Number(value);
}

function stampText(value: unknown): string | null {
  return value === null || value === undefined ? null : value instanceof Date ? value.toISOString() : String(value);
}
