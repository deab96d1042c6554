import { Inject, Injectable } from '@nestjs/common';
import { DataSource, In } from 'typeorm';

import { AthleteEntity } from '../league/entities/athlete.entity.js';
import { AxeEntity } from '../rack/entities/axe.entity.js';
import { ClubEntity } from '../league/entities/club.entity.js';
import { EntryAthleteEntity } from '../meets/entities/entry-athlete.entity.js';
import { EventTypeEntity } from '../meets/entities/event-type.entity.js';
import { MeetEntity } from '../meets/entities/meet.entity.js';
import { MeetStandingEntity } from './entities/meet-standing.entity.js';
import { ResultAuditEntity } from './entities/result-audit.entity.js';
import { ResultEntity } from './entities/result.entity.js';
import type { AxeSetup } from './posted-from-input.js';

/** Meets whose results everyone may read. */
export const VISIBLE_STATUSES = ['PUBLISHED', 'ARCHIVED'] as const;

export interface CoachAddress {
  clubId: string;
  email: string;
  displayName: string;
}

/** Reads for the results pages (the explorer's search lives in its own repository). */
@Injectable()
export class ResultsReadRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  resultsOfMeet(meetId: string): Promise<ResultEntity[]> {
    return this.db.getRepository(ResultEntity).find({ where: { meetId } });
  }

  /** The athletes of each entry, in entry order. */
  async athletesOfEntries(entryIds: readonly string[]): Promise<Map<string, { id: string; name: string }[]>> {
    const map = new Map<string, { id: string; name: string }[]>();
    if (entryIds.length === 0) return map;
    const rows = await this.db
      .getRepository(EntryAthleteEntity)
      .createQueryBuilder('ea')
      .innerJoin(AthleteEntity, 'a', 'a.id = ea.athlete_id')
      .select(['ea.entry_id AS entryId', 'a.id AS id', "CONCAT(a.first_name, ' ', a.last_name) AS name"])
      .where('ea.entry_id IN (:...entryIds)', { entryIds })
      .orderBy('ea.entry_id')
      .addOrderBy('ea.position')
      .getRawMany<{ entryId: string; id: string; name: string }>();
    for (const row of rows) {
      const list = map.get(row.entryId) ?? [];
      list.push({ id: row.id, name: row.name });
      map.set(row.entryId, list);
    }
    return map;
  }

  /** A meet's entries with their athletes' full names, lean, for matching a sheet. */
  async sheetEntries(meetId: string): Promise<{ id: string; meetEventId: string; clubId: string; athleteNames: string[] }[]> {
    const rows = await this.db.query<{ id: string; meetEventId: string; clubId: string; name: string }[]>(
      `SELECT e.id, e.meet_event_id AS meetEventId, e.club_id AS clubId, CONCAT(a.first_name, ' ', a.last_name) AS name
         FROM entries e JOIN meet_events me ON me.id = e.meet_event_id
         JOIN entry_athletes ea ON ea.entry_id = e.id JOIN athletes a ON a.id = ea.athlete_id
        WHERE me.meet_id = ? ORDER BY e.id, ea.position`,
      [meetId],
    );
    const entries = new Map<string, { id: string; meetEventId: string; clubId: string; athleteNames: string[] }>();
    for (const row of rows) {
      const entry = entries.get(row.id) ?? { id: row.id, meetEventId: row.meetEventId, clubId: row.clubId, athleteNames: [] };
      entry.athleteNames.push(row.name);
      entries.set(row.id, entry);
    }
    return [...entries.values()];
  }

  clubsByIds(ids: readonly string[]): Promise<ClubEntity[]> {
    return ids.length ? this.db.getRepository(ClubEntity).findBy({ id: In([...ids]) }) : Promise.resolve([]);
  }

  meetsByIds(ids: readonly string[]): Promise<MeetEntity[]> {
    return ids.length ? this.db.getRepository(MeetEntity).findBy({ id: In([...ids]) }) : Promise.resolve([]);
  }

  eventTypes(): Promise<EventTypeEntity[]> {
    return this.db.getRepository(EventTypeEntity).find();
  }

  /** Published results of the entries an athlete was part of. */
  athleteResults(athleteId: string): Promise<ResultEntity[]> {
    return this.db
      .getRepository(ResultEntity)
      .createQueryBuilder('r')
      .innerJoin(EntryAthleteEntity, 'ea', 'ea.entry_id = r.entry_id AND ea.athlete_id = :athleteId', { athleteId })
      .innerJoin(MeetEntity, 'm', 'm.id = r.meet_id AND m.status IN (:...visible)', { visible: VISIBLE_STATUSES })
      .orderBy('r.meet_date', 'ASC')
      .addOrderBy('r.id', 'ASC')
      .getMany();
  }

  /** Published results chopped with this axe, newest first. */
  axeResults(axeId: string, limit: number): Promise<ResultEntity[]> {
    return this.db
      .getRepository(ResultEntity)
      .createQueryBuilder('r')
      .innerJoin(MeetEntity, 'm', 'm.id = r.meet_id AND m.status IN (:...visible)', { visible: VISIBLE_STATUSES })
      .where('r.axe_id = :axeId', { axeId })
      .orderBy('r.meet_date', 'DESC')
      .addOrderBy('r.id', 'ASC')
      .limit(limit)
      .getMany();
  }

  findAxe(axeId: string): Promise<Pick<AxeEntity, 'id' | 'clubId' | 'isPublic'> | null> {
    return this.db.getRepository(AxeEntity).findOne({ where: { id: axeId }, select: { id: true, clubId: true, isPublic: true } });
  }

  meetStandings(meetId: string): Promise<MeetStandingEntity[]> {
    return this.db.getRepository(MeetStandingEntity).find({ where: { meetId }, order: { division: 'ASC', place: 'ASC' } });
  }

  /** Every published meet of the season with its stored club totals. */
  async seasonMeetStandings(seasonId: string): Promise<{ meets: MeetEntity[]; standings: MeetStandingEntity[] }> {
    const meets = await this.db.getRepository(MeetEntity).find({ where: { seasonId, status: In([...VISIBLE_STATUSES]) }, order: { startsOn: 'ASC' } });
    const standings = meets.length ? await this.db.getRepository(MeetStandingEntity).findBy({ meetId: In(meets.map((m) => m.id)) }) : [];
    return { meets: meets.filter((m) => standings.some((s) => s.meetId === m.id)), standings };
  }

  /** Users holding a coach membership of each club (the publish e-mail goes to them). */
  coachAddresses(clubIds: readonly string[]): Promise<CoachAddress[]> {
    if (clubIds.length === 0) return Promise.resolve([]);
    return this.db.query<CoachAddress[]>(
      `SELECT cm.club_id AS clubId, u.email, u.display_name AS displayName
         FROM club_memberships cm JOIN users u ON u.id = cm.user_id
        WHERE cm.role = 'COACH' AND cm.club_id IN (?) ORDER BY u.email`,
      [clubIds],
    );
  }

  async auditOf(meetId: string): Promise<(ResultAuditEntity & { byName: string | null })[]> {
    const rows = await this.db.getRepository(ResultAuditEntity).find({ where: { meetId }, order: { createdAt: 'DESC', id: 'ASC' } });
    const userIds = [...new Set(rows.map((r) => r.userId).filter((id): id is string => id !== null))];
    const users = userIds.length
      ? await this.db.query<{ id: string; name: string }[]>('SELECT id, display_name AS name FROM users WHERE id IN (?)', [userIds])
      : [];
    const names = new Map(users.map((u) => [u.id, u.name]));
    return rows.map((r) => Object.assign(r, { byName: r.userId ? (names.get(r.userId) ?? null) : null }));
  }

  /** The rack's axe as it is now (its table belongs to the Rack; read here for the snapshot only). */
  /** The axe a coach assigned to the entry in the meet's lineup, if any. */
  async lineupAxeId(entryId: string): Promise<string | null> {
    const rows = await this.db.query<{ axeId: string | null }[]>('SELECT axe_id AS axeId FROM lineup_assignments WHERE entry_id = ?', [entryId]);
    return rows[0]?.axeId ?? null;
  }

  async axeSetup(axeId: string): Promise<AxeSetup | null> {
    return (await this.axes('id = ?', [axeId]))[0] ?? null;
  }

  /** Axes by club and label, for a sheet's "axe label" column. */
  async axesOfClubs(clubIds: readonly string[]): Promise<AxeSetup[]> {
    return clubIds.length ? this.axes('club_id IN (?)', [clubIds]) : [];
  }

  private async axes(where: string, params: unknown[]): Promise<AxeSetup[]> {
    type Row = { id: string; clubId: string; label: string; grind: AxeSetup['grind']; bevel: string | null; chisel: string | null };
    const rows = await this.db.query<Row[]>(
      `SELECT id, club_id AS clubId, label, grind, bevel_included_deg AS bevel, chisel_width_mm AS chisel FROM axes WHERE ${where} ORDER BY club_id, label`,
      params,
    );
    return rows.map((r) => ({ id: r.id, clubId: r.clubId, label: r.label, grind: r.grind, bevelIncludedDeg: decimalOrNull(r.bevel), chiselWidthMm: decimalOrNull(r.chisel) }));
  }
}

function decimalOrNull(value: string | null): number | null {
  return value === null ? null : Number(value);
}
