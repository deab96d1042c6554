import { Inject, Injectable } from '@nestjs/common';
import { DataSource, In, type EntityManager } from 'typeorm';

import { AthleteEntity } from '../league/entities/athlete.entity.js';
import { ClubEntity } from '../league/entities/club.entity.js';
import { EntryEntity } from '../meets/entities/entry.entity.js';
import { MeetEntity } from '../meets/entities/meet.entity.js';
import { UserEntity } from '../users/entities/user.entity.js';
import { AxePhotoEntity } from './entities/axe-photo.entity.js';
import { AxeServiceEntity } from './entities/axe-service.entity.js';
import { AxeEntity } from './entities/axe.entity.js';
import { LineupAssignmentEntity } from './entities/lineup-assignment.entity.js';
import { LineupOverrideEntity } from './entities/lineup-override.entity.js';
import type { AxeStatusValue, AxeUseValue, GrindValue } from './entities/rack-values.js';

export interface RackQuery {
  clubId: string;
  publicOnly: boolean;
  grinds?: GrindValue[];
  statuses?: AxeStatusValue[];
  allowedFor?: AxeUseValue[];
}

export interface AxeStats {
  lastServicedOn: string | null;
  photoCount: number;
}

/** The only place that queries the rack tables (and reads the clubs, entries and people they point at). */
@Injectable()
export class RackRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  axes(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(AxeEntity);
  }
  services(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(AxeServiceEntity);
  }
  photos(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(AxePhotoEntity);
  }
  assignments(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(LineupAssignmentEntity);
  }
  overrides(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(LineupOverrideEntity);
  }

  findClub(id: string): Promise<ClubEntity | null> {
    return this.db.getRepository(ClubEntity).findOneBy({ id });
  }

  findClubByShortName(shortName: string): Promise<ClubEntity | null> {
    return this.db.getRepository(ClubEntity).findOneBy({ shortName });
  }

  async displayName(userId: string): Promise<string> {
    const user = await this.db.getRepository(UserEntity).findOne({ where: { id: userId }, select: { id: true, displayName: true } });
    return user?.displayName ?? 'Unknown user';
  }

  findAxe(id: string): Promise<AxeEntity | null> {
    return this.axes().findOne({ where: { id }, relations: { club: true } });
  }

  rack(q: RackQuery): Promise<AxeEntity[]> {
    const qb = this.axes().createQueryBuilder('a').leftJoinAndSelect('a.club', 'club').where('a.club_id = :clubId', { clubId: q.clubId });
    if (q.publicOnly) qb.andWhere('a.is_public = 1');
    if (q.grinds?.length) qb.andWhere('a.grind IN (:...grinds)', { grinds: q.grinds });
    if (q.statuses?.length) qb.andWhere('a.status IN (:...statuses)', { statuses: q.statuses });
    if (q.allowedFor?.length) qb.andWhere('a.allowed_for IN (:...uses)', { uses: q.allowedFor });
    return qb.orderBy('a.label', 'ASC').getMany();
  }

  async stats(axeIds: string[]): Promise<Map<string, AxeStats>> {
    const out = new Map<string, AxeStats>(axeIds.map((id) => [id, { lastServicedOn: null, photoCount: 0 }]));
    if (axeIds.length === 0) return out;
    const [services, photos] = await Promise.all([
      this.db.query<{ axe_id: string; last: string | Date | null }[]>(
        "SELECT axe_id, DATE_FORMAT(MAX(done_on), '%Y-%m-%d') AS last FROM axe_services WHERE axe_id IN (?) AND kind <> 'SETUP_CORRECTED' GROUP BY axe_id",
        [axeIds],
      ),
      this.db.query<{ axe_id: string; n: string }[]>('SELECT axe_id, COUNT(*) AS n FROM axe_photos WHERE axe_id IN (?) GROUP BY axe_id', [axeIds]),
    ]);
    for (const r of services) out.get(r.axe_id)!.lastServicedOn = r.last === null ? null : String(r.last);
    for (const r of photos) out.get(r.axe_id)!.photoCount = Number(r.n);
    return out;
  }

  servicesOf(axeId: string): Promise<AxeServiceEntity[]> {
    return this.services().find({ where: { axeId }, order: { doneOn: 'DESC', createdAt: 'DESC' } });
  }

  photosOf(axeId: string): Promise<AxePhotoEntity[]> {
    return this.photos().find({ where: { axeId }, order: { createdAt: 'ASC' } });
  }

  findPhoto(id: string): Promise<AxePhotoEntity | null> {
    return this.photos().findOne({ where: { id }, relations: { axe: true } });
  }

  /** The newest service date that changed the setup, so a back-dated entry cannot overwrite it. */
  async latestSetupDate(axeId: string): Promise<string | null> {
    const rows = await this.db.query<{ last: string | null }[]>(
      "SELECT DATE_FORMAT(MAX(done_on), '%Y-%m-%d') AS last FROM axe_services WHERE axe_id = ? AND JSON_LENGTH(changes) > 0",
      [axeId],
    );
    return rows[0]?.last ?? null;
  }

  findMeet(id: string): Promise<MeetEntity | null> {
    return this.db.getRepository(MeetEntity).findOneBy({ id });
  }

  /** The club's entries in a meet with their event, athletes and any lineup assignment. */
  clubEntries(meetId: string, clubId: string): Promise<EntryEntity[]> {
    return this.db
      .getRepository(EntryEntity)
      .createQueryBuilder('e')
      .innerJoinAndSelect('e.meetEvent', 'me', 'me.meet_id = :meetId', { meetId })
      .innerJoinAndSelect('me.eventType', 'et')
      .leftJoinAndSelect('e.athletes', 'ea')
      .leftJoinAndSelect('ea.athlete', 'athlete')
      .where('e.club_id = :clubId', { clubId })
      .orderBy('me.position', 'ASC')
      .addOrderBy('e.heat', 'ASC')
      .addOrderBy('e.draw_position', 'ASC')
      .addOrderBy('ea.position', 'ASC')
      .getMany();
  }

  findEntry(id: string): Promise<EntryEntity | null> {
    return this.db.getRepository(EntryEntity).findOne({
      where: { id },
      relations: { meetEvent: { eventType: true, meet: true }, athletes: { athlete: true } },
    });
  }

  findAthlete(id: string): Promise<AthleteEntity | null> {
    return this.db.getRepository(AthleteEntity).findOneBy({ id });
  }

  assignmentsFor(entryIds: string[]): Promise<LineupAssignmentEntity[]> {
    if (entryIds.length === 0) return Promise.resolve([]);
    return this.assignments().find({ where: { entryId: In(entryIds) }, relations: { athlete: true, axe: true } });
  }

  /** Other assignments of the same axe in the same meet event and heat. */
  sameHeatAssignments(axeId: string, meetEventId: string, heat: number, exceptEntryId: string): Promise<LineupAssignmentEntity[]> {
    return this.assignments()
      .createQueryBuilder('la')
      .innerJoin('la.entry', 'e')
      .leftJoinAndSelect('la.athlete', 'athlete')
      .where('la.axe_id = :axeId', { axeId })
      .andWhere('e.meet_event_id = :meetEventId AND e.heat = :heat', { meetEventId, heat })
      .andWhere('la.entry_id <> :exceptEntryId', { exceptEntryId })
      .getMany();
  }

  overridesOf(meetId: string, clubId: string): Promise<LineupOverrideEntity[]> {
    return this.overrides().find({ where: { meetId, clubId }, order: { createdAt: 'DESC' } });
  }

  findOverrides(ids: string[]): Promise<LineupOverrideEntity[]> {
    return ids.length ? this.overrides().findBy({ id: In(ids) }) : Promise.resolve([]);
  }

  /** How often an axe is on record elsewhere: results, trials (as tested or reference axe) and lineups. */
  async axeUsage(axeId: string): Promise<{ results: number; trials: number; lineups: number }> {
    const [row] = await this.db.query<{ results: string; trials: string; lineups: string }[]>(
      `SELECT (SELECT COUNT(*) FROM results WHERE axe_id = ?) AS results,
              (SELECT COUNT(*) FROM trial_runs WHERE axe_id = ?) + (SELECT COUNT(*) FROM trials WHERE reference_axe_id = ?) AS trials,
              (SELECT COUNT(*) FROM lineup_assignments WHERE axe_id = ?) AS lineups`,
      [axeId, axeId, axeId, axeId],
    );
    return { results: Number(row?.results ?? 0), trials: Number(row?.trials ?? 0), lineups: Number(row?.lineups ?? 0) };
  }
}
