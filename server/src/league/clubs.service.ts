import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { canManageClub } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import type { AthleteInput, ClubInput } from './dto/league.inputs.js';
import { type AthleteEntity } from './entities/athlete.entity.js';
import { LeagueRepository } from './league.repository.js';
import { toAthleteModel, toClubModel } from './league.mappers.js';
import { colour, divisions, email, experience, text } from './league.validation.js';
import type { AthleteModel } from './models/athlete.model.js';
import type { ClubDetailModel, ClubModel } from './models/club.model.js';

@Injectable()
export class ClubsService {
  constructor(@Inject(LeagueRepository) private readonly league: LeagueRepository) {}

  async list(actor: AuthUser | null): Promise<ClubModel[]> {
    const [clubs, counts] = await Promise.all([this.league.clubs.find({ order: { name: 'ASC' } }), this.league.athleteCounts()]);
    return clubs.map((c) => toClubModel(c, counts.get(c.id) ?? 0, actor !== null));
  }

  async detail(id: string, actor: AuthUser | null): Promise<ClubDetailModel> {
    const club = await this.league.clubs.findOneBy({ id });
    if (!club) throw DomainError.notFound('That club');
    const roster = await this.league.roster(id);
    return {
      ...toClubModel(club, roster.length, actor !== null),
      roster: roster.map(toAthleteModel),
      canManage: canManageClub(actor, id),
    };
  }

  async create(input: ClubInput): Promise<ClubModel> {
    const values = this.clubValues(input);
    await this.assertUniqueClub(values.name, values.shortName);
    const id = randomUUID();
    await this.league.clubs.insert({ id, ...values });
    return toClubModel(await this.league.clubs.findOneByOrFail({ id }), 0, true);
  }

  async update(actor: AuthUser, id: string, input: ClubInput): Promise<ClubModel> {
    this.assertCanManage(actor, id);
    const club = await this.league.clubs.findOneBy({ id });
    if (!club) throw DomainError.notFound('That club');
    const values = this.clubValues(input);
    await this.assertUniqueClub(values.name, values.shortName, id);
    await this.league.clubs.update({ id }, values);
    const counts = await this.league.athleteCounts();
    return toClubModel(await this.league.clubs.findOneByOrFail({ id }), counts.get(id) ?? 0, true);
  }

  async athlete(id: string): Promise<AthleteModel> {
    const athlete = await this.league.athletes.findOne({ where: { id }, relations: { club: true } });
    if (!athlete) throw DomainError.notFound('That athlete');
    return toAthleteModel(athlete);
  }

  async addAthlete(actor: AuthUser, input: AthleteInput): Promise<AthleteModel> {
    this.assertCanManage(actor, input.clubId);
    if (!(await this.league.clubs.findOneBy({ id: input.clubId }))) throw DomainError.notFound('That club');
    const id = randomUUID();
    await this.league.athletes.insert({ id, clubId: input.clubId, userId: null, ...this.athleteValues(input) });
    return this.athlete(id);
  }

  async updateAthlete(actor: AuthUser, id: string, input: AthleteInput): Promise<AthleteModel> {
    const athlete = await this.league.athletes.findOneBy({ id });
    if (!athlete) throw DomainError.notFound('That athlete');
    this.assertCanManage(actor, athlete.clubId);
    if (input.clubId !== athlete.clubId) {
      throw DomainError.badInput('clubId', 'An athlete moves club through the league office, not the roster form.');
    }
    await this.league.athletes.update({ id }, this.athleteValues(input));
    return this.athlete(id);
  }

  async removeAthlete(actor: AuthUser, id: string): Promise<boolean> {
    const athlete = await this.league.athletes.findOneBy({ id });
    if (!athlete) throw DomainError.notFound('That athlete');
    this.assertCanManage(actor, athlete.clubId);
    const rows = await this.league.db.query<{ n: string }[]>('SELECT COUNT(*) AS n FROM entry_athletes WHERE athlete_id = ?', [id]);
    if (Number(rows[0]?.n ?? 0) > 0) {
      throw DomainError.badInput('athleteId', `${athlete.firstName} ${athlete.lastName} has meet entries; withdraw them first (results are kept for the record).`);
    }
    await this.league.athletes.delete({ id });
    return true;
  }

  assertCanManage(actor: AuthUser, clubId: string): void {
    if (!canManageClub(actor, clubId)) throw DomainError.forbidden("Only this club's coaches can do that.");
  }

  private clubValues(input: ClubInput) {
    return {
      name: text('name', 'Club name', input.name, 3, 120),
      shortName: text('shortName', 'Short name', input.shortName, 2, 16).toUpperCase(),
      region: text('region', 'Region', input.region, 2, 80),
      contactEmail: email('contactEmail', input.contactEmail, { optional: true }),
      colourPrimary: colour('colourPrimary', input.colourPrimary, '#2f5d3a'),
      colourSecondary: colour('colourSecondary', input.colourSecondary, '#c9a66b'),
    };
  }

  private athleteValues(input: AthleteInput): Pick<AthleteEntity, 'firstName' | 'lastName' | 'divisions' | 'experience' | 'firstSeasonYear'> {
    const year = input.firstSeasonYear ?? null;
    if (year !== null && (year < 1950 || year > 2100)) throw DomainError.badInput('firstSeasonYear', 'First season must be a year such as 2025.');
    return {
      firstName: text('firstName', 'First name', input.firstName, 1, 60),
      lastName: text('lastName', 'Last name', input.lastName, 1, 60),
      divisions: divisions('divisions', input.divisions),
      experience: experience('experience', input.experience),
      firstSeasonYear: year,
    };
  }

  private async assertUniqueClub(name: string, shortName: string, exceptId?: string): Promise<void> {
    const byName = await this.league.clubs.findOneBy({ name });
    if (byName && byName.id !== exceptId) throw DomainError.badInput('name', `A club called "${name}" already exists.`);
    const byShort = await this.league.clubs.findOneBy({ shortName });
    if (byShort && byShort.id !== exceptId) throw DomainError.badInput('shortName', `The short name "${shortName}" is taken.`);
  }
}
