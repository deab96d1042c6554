import { Inject, Injectable } from '@nestjs/common';
import { speciesById } from '@endgrain/shared';

import { DivisionEnum } from '../league/models/league.enums.js';
import type { EventTypeEntity } from '../meets/entities/event-type.entity.js';
import { ResultKindEnum } from '../meets/models/meets.enums.js';
import { GrindEnum } from '../rack/models/rack.enums.js';
import type { ResultEntity } from './entities/result.entity.js';
import type { ResultModel } from './models/result.model.js';
import { BlockConditionEnum, ResultStatusEnum } from './models/results.enums.js';
import { ResultsReadRepository } from './results-read.repository.js';

/** Turns stored results into API models, looking up names for a whole batch at once. */
@Injectable()
export class ResultHydrator {
  private types: Promise<Map<string, EventTypeEntity>> | null = null;

  constructor(@Inject(ResultsReadRepository) private readonly read: ResultsReadRepository) {}

  async models(results: readonly ResultEntity[]): Promise<ResultModel[]> {
    if (results.length === 0) return [];
    const unique = <T>(items: T[]): T[] => [...new Set(items)];
    const [types, athletes, clubs, meets] = await Promise.all([
      this.eventTypes(results.map((r) => r.eventTypeId)),
      this.read.athletesOfEntries(results.map((r) => r.entryId)),
      this.read.clubsByIds(unique(results.map((r) => r.clubId))),
      this.read.meetsByIds(unique(results.map((r) => r.meetId))),
    ]);
    const clubById = new Map(clubs.map((c) => [c.id, c]));
    const meetById = new Map(meets.map((m) => [m.id, m]));
    return results.map((r) => {
      const type = types.get(r.eventTypeId);
      const club = clubById.get(r.clubId);
      const people = athletes.get(r.entryId) ?? [];
      return {
        id: r.id,
        entryId: r.entryId,
        meetEventId: r.meetEventId,
        meetId: r.meetId,
        meetName: meetById.get(r.meetId)?.name ?? '',
        meetDate: r.meetDate,
        seasonId: r.seasonId,
        eventTypeId: r.eventTypeId,
        eventCode: type?.code ?? '',
        eventName: type?.name ?? '',
        resultKind: ResultKindEnum[type?.resultKind ?? 'TIMED'],
        division: DivisionEnum[r.division],
        clubId: r.clubId,
        clubName: club?.name ?? '',
        clubShortName: club?.shortName ?? '',
        athletes: people,
        label: people.map((a) => a.name).join(' & '),
        status: ResultStatusEnum[r.finalStatus],
        postedStatus: ResultStatusEnum[r.status],
        reason: r.finalReason,
        rawTimes: r.rawTimes,
        timeHundredths: r.timeHundredths,
        penaltyHundredths: r.penaltyHundredths,
        totalHundredths: r.totalHundredths,
        score: r.score,
        place: r.place,
        tied: r.tied,
        points: r.points,
        countsForClub: r.countsForClub,
        provisional: r.provisional,
        runOffRank: r.runOffRank,
        axeId: r.axeId,
        axeLabel: r.axeLabel,
        grind: r.grind ? GrindEnum[r.grind] : null,
        bevelIncludedDeg: r.bevelIncludedDeg,
        chiselWidthMm: r.chiselWidthMm,
        speciesId: r.speciesId,
        speciesName: r.speciesId ? (speciesById(r.speciesId)?.commonName ?? r.speciesId) : null,
        diameterMm: r.diameterMm,
        condition: r.blockCondition ? BlockConditionEnum[r.blockCondition] : null,
        recordedAt: r.updatedAt,
      };
    });
  }

  /** The catalogue changes rarely (admins only): read once, and again when an id is new. */
  async eventTypes(ids: readonly string[] = []): Promise<Map<string, EventTypeEntity>> {
    this.types ??= this.load();
    const types = await this.types;
    if (ids.every((id) => types.has(id))) return types;
    this.types = this.load();
    return this.types;
  }

  private load(): Promise<Map<string, EventTypeEntity>> {
    return this.read.eventTypes().then((rows) => new Map(rows.map((t) => [t.id, t])));
  }
}
