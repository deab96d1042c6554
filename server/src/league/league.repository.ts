import { Inject, Injectable } from '@nestjs/common';
import { DataSource, In } from 'typeorm';

import { AthleteEntity } from './entities/athlete.entity.js';
import { ClubInvitationEntity } from './entities/club-invitation.entity.js';
import { ClubEntity } from './entities/club.entity.js';
import { SeasonEntity } from './entities/season.entity.js';

/** The only place that queries seasons, clubs, athletes and invitations. */
@Injectable()
export class LeagueRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  get seasons() {
    return this.db.getRepository(SeasonEntity);
  }

  get clubs() {
    return this.db.getRepository(ClubEntity);
  }

  get athletes() {
    return this.db.getRepository(AthleteEntity);
  }

  get invitations() {
    return this.db.getRepository(ClubInvitationEntity);
  }

  listSeasons(): Promise<SeasonEntity[]> {
    return this.seasons.find({ order: { startsOn: 'DESC' } });
  }

  async athleteCounts(): Promise<Map<string, number>> {
    const rows = await this.athletes
      .createQueryBuilder('a')
      .select('a.club_id', 'clubId')
      .addSelect('COUNT(*)', 'n')
      .groupBy('a.club_id')
      .getRawMany<{ clubId: string; n: string }>();
    return new Map(rows.map((r) => [r.clubId, Number(r.n)]));
  }

  roster(clubId: string): Promise<AthleteEntity[]> {
    return this.athletes.find({ where: { clubId }, relations: { club: true }, order: { lastName: 'ASC', firstName: 'ASC' } });
  }

  athletesByIds(ids: string[]): Promise<AthleteEntity[]> {
    return ids.length ? this.athletes.find({ where: { id: In(ids) }, relations: { club: true } }) : Promise.resolve([]);
  }
}
