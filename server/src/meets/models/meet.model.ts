import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

import { DivisionEnum } from '../../league/models/league.enums.js';
import { EventTypeModel } from './event-type.model.js';
import { MeetStatusEnum, ScoringSchemeEnum } from './meets.enums.js';

@ObjectType('EntryAthlete')
export class EntryAthleteModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  name: string;
}

@ObjectType('Entry')
export class EntryModel {
  @Field(() => ID)
  id: string;

  @Field(() => ID)
  meetEventId: string;

  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => String)
  clubShortName: string;

  @Field(() => [EntryAthleteModel])
  athletes: EntryAthleteModel[];

  @Field(() => String, { description: 'Athletes joined with " & "' })
  label: string;

  @Field(() => Int, { nullable: true })
  drawPosition: number | null;

  @Field(() => Int, { nullable: true })
  heat: number | null;
}

@ObjectType('MeetEvent')
export class MeetEventModel {
  @Field(() => ID)
  id: string;

  @Field(() => ID)
  meetId: string;

  @Field(() => EventTypeModel)
  eventType: EventTypeModel;

  @Field(() => DivisionEnum)
  division: DivisionEnum;

  @Field(() => String, { nullable: true })
  speciesId: string | null;

  @Field(() => String, { nullable: true })
  speciesName: string | null;

  @Field(() => Float, { nullable: true })
  diameterMm: number | null;

  @Field(() => Int, { nullable: true })
  timeLimitHundredths: number | null;

  @Field(() => Float)
  weight: number;

  @Field(() => ScoringSchemeEnum, { nullable: true })
  scoringScheme: ScoringSchemeEnum | null;

  @Field(() => [Float], { nullable: true })
  pointsTable: number[] | null;

  @Field(() => String)
  notes: string;

  @Field(() => Int)
  position: number;

  @Field(() => Int, { nullable: true })
  heatSize: number | null;

  @Field(() => Int, { nullable: true, description: 'Seed of the stored draw; the same seed reproduces it' })
  drawSeed: number | null;

  @Field(() => [EntryModel])
  entries: EntryModel[];
}

@ObjectType('Meet')
export class MeetModel {
  @Field(() => ID)
  id: string;

  @Field(() => ID)
  seasonId: string;

  @Field(() => String)
  seasonName: string;

  @Field(() => ID)
  hostClubId: string;

  @Field(() => String)
  hostClubName: string;

  @Field(() => String)
  name: string;

  @Field(() => String, { description: 'ISO date' })
  startsOn: string;

  @Field(() => String)
  venue: string;

  @Field(() => Date)
  entryDeadline: Date;

  @Field(() => [DivisionEnum])
  divisions: DivisionEnum[];

  @Field(() => ScoringSchemeEnum)
  scoringScheme: ScoringSchemeEnum;

  @Field(() => [Float], { nullable: true })
  pointsTable: number[] | null;

  @Field(() => Boolean)
  bestEntryPerClub: boolean;

  @Field(() => Boolean)
  minimumOnePoint: boolean;

  @Field(() => Int)
  runOffTopPlaces: number;

  @Field(() => Int, { nullable: true })
  maxEventsPerAthlete: number | null;

  @Field(() => Boolean)
  requireMixedPairs: boolean;

  @Field(() => MeetStatusEnum)
  status: MeetStatusEnum;

  @Field(() => Boolean, { description: 'Entries are accepted now (status and deadline)' })
  entriesOpen: boolean;

  @Field(() => Int)
  eventCount: number;

  @Field(() => Int)
  entryCount: number;
}

@ObjectType('MeetDetail')
export class MeetDetailModel extends MeetModel {
  @Field(() => [MeetEventModel])
  events: MeetEventModel[];

  @Field(() => Boolean, { description: 'The caller may build and run this meet' })
  canManage: boolean;

  @Field(() => [ID], { description: "Clubs whose entries the caller may make" })
  enterableClubIds: string[];

  @Field(() => Boolean, { description: "The caller is one of this meet's appointed timekeepers" })
  isTimekeeper: boolean;
}

@ObjectType('MeetTimekeeper')
export class MeetTimekeeperModel {
  @Field(() => ID)
  userId: string;

  @Field(() => String)
  displayName: string;

  @Field(() => String)
  email: string;

  @Field(() => Date)
  appointedAt: Date;
}

@ObjectType('MeetChange')
export class MeetChangeModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  summary: string;

  @Field(() => String, { nullable: true })
  byUserId: string | null;

  @Field(() => String, { nullable: true, description: 'Who made the change, when the account still exists' })
  byName: string | null;

  @Field(() => Date)
  at: Date;

  @Field(() => String, { description: 'JSON of the values before' })
  before: string;

  @Field(() => String, { description: 'JSON of the values after' })
  after: string;
}
