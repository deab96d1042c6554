import type { AthleteEntity } from './entities/athlete.entity.js';
import type { ClubEntity } from './entities/club.entity.js';
import type { SeasonEntity } from './entities/season.entity.js';
import type { AthleteModel } from './models/athlete.model.js';
import type { ClubModel } from './models/club.model.js';
import { DivisionEnum, ExperienceEnum } from './models/league.enums.js';
import type { SeasonModel } from './models/season.model.js';

export function toSeasonModel(s: SeasonEntity): SeasonModel {
  return { id: s.id, name: s.name, startsOn: s.startsOn, endsOn: s.endsOn, isCurrent: Boolean(s.isCurrent) };
}

export function toClubModel(c: ClubEntity, athleteCount: number, showContact: boolean): ClubModel {
  return {
    id: c.id,
    name: c.name,
    shortName: c.shortName,
    region: c.region,
    contactEmail: showContact ? c.contactEmail : null,
    colourPrimary: c.colourPrimary,
    colourSecondary: c.colourSecondary,
    athleteCount,
  };
}

export function toAthleteModel(a: AthleteEntity): AthleteModel {
  return {
    id: a.id,
    clubId: a.clubId,
    clubName: a.club?.name ?? '',
    firstName: a.firstName,
    lastName: a.lastName,
    name: `${a.firstName} ${a.lastName}`,
    divisions: a.divisions.map((d) => DivisionEnum[d]),
    experience: ExperienceEnum[a.experience],
    firstSeasonYear: a.firstSeasonYear,
    hasAccount: a.userId !== null,
  };
}
