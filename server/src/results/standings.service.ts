import { Inject, Injectable } from '@nestjs/common';
import { canRunMeets, DIVISIONS, isMeetPublic, meetTieBreak, seasonStandings, type Division } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { LeagueRepository } from '../league/league.repository.js';
import { DivisionEnum } from '../league/models/league.enums.js';
import { MeetsRepository } from '../meets/meets.repository.js';
import { MeetStatusEnum } from '../meets/models/meets.enums.js';
import type { MeetStandingEntity } from './entities/meet-standing.entity.js';
import type { ClubStandingModel, DivisionStandingModel, MeetStandingsModel, SeasonStandingsModel } from './models/standings.model.js';
import { ResultHydrator } from './result-hydrator.js';
import { ResultsReadRepository } from './results-read.repository.js';
import { resultOrder, resultsVisible } from './results.service.js';

interface Named {
  clubName: string;
  clubShortName: string;
}

/** Meet standings (stored with every change) and season standings (summed from them). */
@Injectable()
export class StandingsService {
  constructor(
    @Inject(MeetsRepository) private readonly meetsRepo: MeetsRepository,
    @Inject(LeagueRepository) private readonly league: LeagueRepository,
    @Inject(ResultsReadRepository) private readonly read: ResultsReadRepository,
    @Inject(ResultHydrator) private readonly hydrator: ResultHydrator,
  ) {}

  async meet(actor: AuthUser | null, meetId: string, division: Division | null): Promise<MeetStandingsModel> {
    const meet = await this.meetsRepo.findMeet(meetId);
    if (!meet || (!isMeetPublic(meet.status) && !canRunMeets(actor))) throw DomainError.notFound('That meet');
    const published = resultsVisible(meet);
    const readable = published || canRunMeets(actor);
    const rows = readable ? (await this.read.meetStandings(meetId)).filter((r) => !division || r.division === division) : [];
    const names = await this.names(rows.map((r) => r.clubId));
    const winners = readable ? (await this.read.resultsOfMeet(meetId)).filter((r) => r.place === 1 && (!division || r.division === division)) : [];
    const divisions = [...groupByDivision(rows)].map(([d, clubs]) => ({
      division: DivisionEnum[d],
      provisional: clubs.some((c) => c.provisional),
      clubs: clubs.sort((a, b) => a.place - b.place || a.clubId.localeCompare(b.clubId)).map((c) => ({ ...this.named(names, c.clubId), ...standing(c), meets: 1 })),
    }));
    const events = new Map((await this.meetsRepo.eventsOf(meetId)).map((e) => [e.id, e.position]));
    return {
      meetId: meet.id,
      meetName: meet.name,
      startsOn: meet.startsOn,
      status: MeetStatusEnum[meet.status],
      published,
      tieBreak: meetTieBreak,
      provisional: divisions.some((d) => d.provisional),
      divisions,
      eventWinners: (await this.hydrator.models(winners)).sort((a, b) => (events.get(a.meetEventId) ?? 0) - (events.get(b.meetEventId) ?? 0) || resultOrder(a, b)),
    };
  }

  async season(seasonId: string, division: Division | null): Promise<SeasonStandingsModel> {
    const season = await this.league.seasons.findOneBy({ id: seasonId });
    if (!season) throw DomainError.notFound('That season');
    const { meets, standings } = await this.read.seasonMeetStandings(seasonId);
    const totals = seasonStandings(
      meets.map((meet) => {
        const mine = standings.filter((s) => s.meetId === meet.id);
        return {
          provisional: mine.some((s) => s.provisional),
          divisions: [...groupByDivision(mine)].map(([d, clubs]) => ({ division: d, clubs: clubs.map(standing) })),
        };
      }),
    );
    const names = await this.names(standings.map((s) => s.clubId));
    const divisions: DivisionStandingModel[] = totals.divisions
      .filter((d) => !division || d.division === division)
      .sort((a, b) => divisionOrder(a.division) - divisionOrder(b.division))
      .map((d) => ({
        division: DivisionEnum[d.division as Division],
        provisional: standings.some((s) => s.division === d.division && s.provisional),
        clubs: d.clubs.map((c) => ({ ...this.named(names, c.clubId), clubId: c.clubId, points: c.points, place: c.place, tied: c.tied, placeCounts: c.placeCounts, meets: c.meets })),
      }));
    return {
      seasonId,
      seasonName: season.name,
      tieBreak: totals.tieBreak,
      provisional: totals.provisional,
      meets: meets.map((m) => ({ id: m.id, name: m.name, startsOn: m.startsOn })),
      divisions,
    };
  }

  private async names(clubIds: string[]): Promise<Map<string, Named>> {
    const clubs = await this.read.clubsByIds([...new Set(clubIds)]);
    return new Map(clubs.map((c) => [c.id, { clubName: c.name, clubShortName: c.shortName }]));
  }

  private named(names: Map<string, Named>, clubId: string): Named {
    return names.get(clubId) ?? { clubName: '', clubShortName: '' };
  }
}

function standing(row: MeetStandingEntity): Omit<ClubStandingModel, keyof Named | 'meets'> {
  return { clubId: row.clubId, points: row.points, place: row.place, tied: row.tied, placeCounts: row.placeCounts };
}

function groupByDivision(rows: readonly MeetStandingEntity[]): Map<Division, MeetStandingEntity[]> {
  const groups = new Map<Division, MeetStandingEntity[]>();
  for (const row of [...rows].sort((a, b) => divisionOrder(a.division) - divisionOrder(b.division))) {
    const list = groups.get(row.division) ?? [];
    list.push(row);
    groups.set(row.division, list);
  }
  return groups;
}

function divisionOrder(division: string): number {
  return DIVISIONS.indexOf(division as Division);
}
