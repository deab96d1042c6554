import { Inject, Injectable } from '@nestjs/common';
import { DataSource, In } from 'typeorm';

import { EntryAthleteEntity } from './entities/entry-athlete.entity.js';
import { EntryEntity } from './entities/entry.entity.js';
import { EventTypeEntity } from './entities/event-type.entity.js';
import { MeetChangeEntity } from './entities/meet-change.entity.js';
import { MeetEventEntity } from './entities/meet-event.entity.js';
import { MeetEntity } from './entities/meet.entity.js';
import { MeetTimekeeperEntity } from './entities/meet-timekeeper.entity.js';
import { UserEntity } from '../users/entities/user.entity.js';

export interface MeetListFilter {
  seasonId?: string | null;
  statuses?: string[];
  fromDate?: string;
  beforeDate?: string;
  clubId?: string | null;
}

export interface MeetCounts {
  events: number;
  entries: number;
}

/** The only place that queries meets, meet events and entries. */
@Injectable()
export class MeetsRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  get meets() {
    return this.db.getRepository(MeetEntity);
  }
  get meetEvents() {
    return this.db.getRepository(MeetEventEntity);
  }
  get entries() {
    return this.db.getRepository(EntryEntity);
  }
  get eventTypes() {
    return this.db.getRepository(EventTypeEntity);
  }
  get changes() {
    return this.db.getRepository(MeetChangeEntity);
  }
  get timekeepers() {
    return this.db.getRepository(MeetTimekeeperEntity);
  }

  async isTimekeeper(meetId: string, userId: string): Promise<boolean> {
    return (await this.timekeepers.countBy({ meetId, userId })) > 0;
  }

  /** A meet's timekeepers with their names and addresses, in the order they were appointed. */
  timekeepersOf(meetId: string): Promise<{ userId: string; displayName: string; email: string; appointedAt: Date }[]> {
    return this.timekeepers
      .createQueryBuilder('t')
      .innerJoin(UserEntity, 'u', 'u.id = t.user_id')
      .select(['t.user_id AS userId', 'u.display_name AS displayName', 'u.email AS email', 't.created_at AS appointedAt'])
      .where('t.meet_id = :meetId', { meetId })
      .orderBy('t.created_at', 'ASC')
      .getRawMany();
  }

  async userNames(ids: readonly string[]): Promise<Map<string, string>> {
    if (ids.length === 0) return new Map();
    const users = await this.db.getRepository(UserEntity).find({ where: { id: In([...new Set(ids)]) }, select: { id: true, displayName: true } });
    return new Map(users.map((u) => [u.id, u.displayName]));
  }

  findUserByEmail(email: string): Promise<Pick<UserEntity, 'id' | 'displayName'> | null> {
    return this.db.getRepository(UserEntity).findOne({ where: { email }, select: { id: true, displayName: true } });
  }

  list(filter: MeetListFilter): Promise<MeetEntity[]> {
    const q = this.meets
      .createQueryBuilder('m')
      .leftJoinAndSelect('m.season', 'season')
      .leftJoinAndSelect('m.hostClub', 'host');
    if (filter.seasonId) q.andWhere('m.season_id = :seasonId', { seasonId: filter.seasonId });
    if (filter.statuses?.length) q.andWhere('m.status IN (:...statuses)', { statuses: filter.statuses });
    if (filter.fromDate) q.andWhere('m.starts_on >= :from', { from: filter.fromDate });
    if (filter.beforeDate) q.andWhere('m.starts_on < :before', { before: filter.beforeDate });
    if (filter.clubId) {
      q.andWhere(
        '(m.host_club_id = :club OR EXISTS (SELECT 1 FROM entries e JOIN meet_events me ON me.id = e.meet_event_id WHERE me.meet_id = m.id AND e.club_id = :club))',
        { club: filter.clubId },
      );
    }
    const ascending = Boolean(filter.fromDate);
    return q.orderBy('m.starts_on', ascending ? 'ASC' : 'DESC').addOrderBy('m.name', 'ASC').getMany();
  }

  async counts(meetIds: string[]): Promise<Map<string, MeetCounts>> {
    if (meetIds.length === 0) return new Map();
    const rows = await this.db.query<{ meet_id: string; events: string; entries: string }[]>(
      `SELECT me.meet_id, COUNT(DISTINCT me.id) AS events, COUNT(e.id) AS entries
         FROM meet_events me LEFT JOIN entries e ON e.meet_event_id = me.id
        WHERE me.meet_id IN (?) GROUP BY me.meet_id`,
      [meetIds],
    );
    return new Map(rows.map((r) => [r.meet_id, { events: Number(r.events), entries: Number(r.entries) }]));
  }

  findMeet(id: string): Promise<MeetEntity | null> {
    return this.meets.findOne({ where: { id }, relations: { season: true, hostClub: true } });
  }

  eventsOf(meetId: string): Promise<MeetEventEntity[]> {
    return this.meetEvents.find({ where: { meetId }, relations: { eventType: true }, order: { position: 'ASC' } });
  }

  findMeetEvent(id: string): Promise<MeetEventEntity | null> {
    return this.meetEvents.findOne({ where: { id }, relations: { eventType: true, meet: true } });
  }

  entriesOfMeet(meetId: string): Promise<EntryEntity[]> {
    return this.entries
      .createQueryBuilder('e')
      .innerJoin('e.meetEvent', 'me', 'me.meet_id = :meetId', { meetId })
      .leftJoinAndSelect('e.club', 'club')
      .leftJoinAndSelect('e.athletes', 'ea')
      .leftJoinAndSelect('ea.athlete', 'athlete')
      .orderBy('e.draw_position', 'ASC')
      .addOrderBy('e.created_at', 'ASC')
      .addOrderBy('ea.position', 'ASC')
      .getMany();
  }

  /** How many events of the meet each athlete is entered in. */
  async eventsPerAthlete(meetId: string): Promise<Map<string, number>> {
    const rows = await this.db
      .getRepository(EntryAthleteEntity)
      .createQueryBuilder('ea')
      .innerJoin(MeetEventEntity, 'me', 'me.id = ea.meet_event_id')
      .select('ea.athlete_id', 'athleteId')
      .addSelect('COUNT(*)', 'n')
      .where('me.meet_id = :meetId', { meetId })
      .groupBy('ea.athlete_id')
      .getRawMany<{ athleteId: string; n: string }>();
    return new Map(rows.map((r) => [r.athleteId, Number(r.n)]));
  }

  async athletesInEvent(meetEventId: string): Promise<Set<string>> {
    const rows = await this.db.getRepository(EntryAthleteEntity).find({ where: { meetEventId }, select: { athleteId: true } });
    return new Set(rows.map((r) => r.athleteId));
  }
}
