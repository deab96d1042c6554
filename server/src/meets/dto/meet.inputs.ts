import { Field, Float, ID, InputType, Int } from '@nestjs/graphql';

import { DivisionEnum } from '../../league/models/league.enums.js';
import { MeetStatusEnum, MeetWhenEnum, ScoringSchemeEnum } from '../models/meets.enums.js';

@InputType()
export class MeetInput {
  @Field(() => String)
  name: string;

  @Field(() => ID)
  seasonId: string;

  @Field(() => ID)
  hostClubId: string;

  @Field(() => String, { description: 'ISO date of the meet' })
  startsOn: string;

  @Field(() => String)
  venue: string;

  @Field(() => Date)
  entryDeadline: Date;

  @Field(() => [DivisionEnum])
  divisions: DivisionEnum[];

  @Field(() => ScoringSchemeEnum)
  scoringScheme: ScoringSchemeEnum;

  @Field(() => [Float], { nullable: true, description: 'Place points for a fixed table, first place first' })
  pointsTable?: number[] | null;

  @Field(() => Boolean, { defaultValue: false })
  bestEntryPerClub: boolean;

  @Field(() => Boolean, { defaultValue: false })
  minimumOnePoint: boolean;

  @Field(() => Int, { defaultValue: 0 })
  runOffTopPlaces: number;

  @Field(() => Int, { nullable: true })
  maxEventsPerAthlete?: number | null;

  @Field(() => Boolean, { defaultValue: true })
  requireMixedPairs: boolean;

  @Field(() => String, { nullable: true, description: 'Why the scoring changed (recorded once results exist)' })
  reason?: string | null;
}

@InputType()
export class MeetEventInput {
  @Field(() => ID)
  eventTypeId: string;

  @Field(() => DivisionEnum)
  division: DivisionEnum;

  @Field(() => String, { nullable: true })
  speciesId?: string | null;

  @Field(() => Float, { nullable: true, description: 'Block diameter in millimetres (the client converts inches)' })
  diameterMm?: number | null;

  @Field(() => Int, { nullable: true })
  timeLimitHundredths?: number | null;

  @Field(() => Float, { defaultValue: 1 })
  weight: number;

  @Field(() => ScoringSchemeEnum, { nullable: true })
  scoringScheme?: ScoringSchemeEnum | null;

  @Field(() => [Float], { nullable: true })
  pointsTable?: number[] | null;

  @Field(() => String, { defaultValue: '' })
  notes: string;
}

@InputType()
export class EnterMeetEventInput {
  @Field(() => ID)
  meetEventId: string;

  @Field(() => ID)
  clubId: string;

  @Field(() => [ID])
  athleteIds: string[];
}

@InputType()
export class DrawOrderInput {
  @Field(() => ID)
  meetEventId: string;

  @Field(() => Int)
  heatSize: number;

  @Field(() => Int, { nullable: true, description: 'Repeat a stored draw by giving its seed; omit for a fresh draw' })
  seed?: number | null;
}

@InputType()
export class MeetsFilter {
  @Field(() => ID, { nullable: true })
  seasonId?: string | null;

  @Field(() => MeetWhenEnum, { nullable: true })
  when?: MeetWhenEnum | null;

  @Field(() => MeetStatusEnum, { nullable: true })
  status?: MeetStatusEnum | null;

  @Field(() => ID, { nullable: true, description: 'Meets hosted by or entered by this club' })
  clubId?: string | null;
}
