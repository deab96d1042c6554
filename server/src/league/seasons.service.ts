import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';

import { DomainError } from '../common/errors/domain-error.js';
import { SeasonEntity } from './entities/season.entity.js';
import type { CreateSeasonInput } from './dto/league.inputs.js';
import { LeagueRepository } from './league.repository.js';
import { toSeasonModel } from './league.mappers.js';
import { isoDate, text } from './league.validation.js';
import type { SeasonModel } from './models/season.model.js';

@Injectable()
export class SeasonsService {
  constructor(@Inject(LeagueRepository) private readonly league: LeagueRepository) {}

  async list(): Promise<SeasonModel[]> {
    return (await this.league.listSeasons()).map(toSeasonModel);
  }

  async create(input: CreateSeasonInput): Promise<SeasonModel> {
    const name = text('name', 'Season name', input.name, 2, 80);
    const startsOn = isoDate('startsOn', 'Start date', input.startsOn);
    const endsOn = isoDate('endsOn', 'End date', input.endsOn);
    if (endsOn <= startsOn) throw DomainError.badInput('endsOn', 'The season must end after it starts.');
    if (await this.league.seasons.findOneBy({ name })) throw DomainError.badInput('name', `A season called "${name}" already exists.`);
    const season: SeasonEntity = { id: randomUUID(), name, startsOn, endsOn, isCurrent: false };
    await this.league.db.transaction(async (m) => {
      await m.getRepository(SeasonEntity).insert(season);
      if (input.makeCurrent) await this.makeCurrentIn(m, season.id);
    });
    return toSeasonModel(await this.league.seasons.findOneByOrFail({ id: season.id }));
  }

  async setCurrent(id: string): Promise<SeasonModel> {
    if (!(await this.league.seasons.findOneBy({ id }))) throw DomainError.notFound('That season');
    await this.league.db.transaction((m) => this.makeCurrentIn(m, id));
    return toSeasonModel(await this.league.seasons.findOneByOrFail({ id }));
  }

  private async makeCurrentIn(manager: EntityManager, id: string): Promise<void> {
    await manager.query('UPDATE seasons SET is_current = (id = ?)', [id]);
  }
}
