import { Field, ID, Int, ObjectType } from '@nestjs/graphql';

import { DivisionEnum, ExperienceEnum } from '../../league/models/league.enums.js';
import { AxeStatusEnum, AxeUseEnum } from './rack.enums.js';

@ObjectType('LineupOverride', { description: 'A recorded decision to hand an axe to an athlete below its experience rule' })
export class LineupOverrideModel {
  @Field(() => ID)
  id: string;

  @Field(() => ID)
  entryId: string;

  @Field(() => String)
  athleteName: string;

  @Field(() => ExperienceEnum)
  athleteExperience: ExperienceEnum;

  @Field(() => String)
  axeLabel: string;

  @Field(() => AxeUseEnum)
  axeAllowedFor: AxeUseEnum;

  @Field(() => String)
  reason: string;

  @Field(() => String)
  byName: string;

  @Field(() => Date)
  at: Date;
}

@ObjectType('LineupAssignment')
export class LineupAssignmentModel {
  @Field(() => ID)
  entryId: string;

  @Field(() => ID)
  athleteId: string;

  @Field(() => String)
  athleteName: string;

  @Field(() => ID, { nullable: true })
  axeId: string | null;

  @Field(() => String, { nullable: true })
  axeLabel: string | null;

  @Field(() => AxeStatusEnum, { nullable: true })
  axeStatus: AxeStatusEnum | null;

  @Field(() => LineupOverrideModel, { nullable: true })
  override: LineupOverrideModel | null;

  @Field(() => Date)
  updatedAt: Date;
}

@ObjectType('LineupAthlete')
export class LineupAthleteModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  name: string;

  @Field(() => ExperienceEnum)
  experience: ExperienceEnum;
}

@ObjectType('LineupEntry')
export class LineupEntryModel {
  @Field(() => ID)
  entryId: string;

  @Field(() => ID)
  meetEventId: string;

  @Field(() => String)
  eventName: string;

  @Field(() => DivisionEnum)
  division: DivisionEnum;

  @Field(() => Int, { nullable: true })
  heat: number | null;

  @Field(() => Boolean, { description: 'The event is chopped with an axe head' })
  usesHead: boolean;

  @Field(() => [LineupAthleteModel])
  athletes: LineupAthleteModel[];

  @Field(() => LineupAssignmentModel, { nullable: true })
  assignment: LineupAssignmentModel | null;

  @Field(() => [String], { description: 'Rack warnings for this assignment as it stands' })
  warnings: string[];
}

@ObjectType('Lineup')
export class LineupModel {
  @Field(() => ID)
  meetId: string;

  @Field(() => String)
  meetName: string;

  @Field(() => String, { description: 'ISO date' })
  meetDate: string;

  @Field(() => String)
  venue: string;

  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => Boolean)
  canManage: boolean;

  @Field(() => [LineupEntryModel])
  entries: LineupEntryModel[];
}

@ObjectType('AssignLineupPayload')
export class AssignLineupPayload {
  @Field(() => LineupAssignmentModel)
  assignment: LineupAssignmentModel;

  @Field(() => [String], { description: 'Accepted, but worth a second look (needs edge, same heat, override)' })
  warnings: string[];
}
