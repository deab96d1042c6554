import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

@ObjectType({ description: 'A past time behind an expected time' })
export class HandicapHistoryModel {
  @Field(() => String) date: string;
  @Field(() => String) meetName: string;
  @Field(() => Int) hundredths: number;
  @Field(() => Float) diameterMm: number;
  @Field(() => Float, { description: "Rescaled to this event's block" }) onBlockHundredths: number;
}

@ObjectType()
export class HandicapMarkModel {
  @Field(() => ID) athleteId: string;
  @Field(() => String) athleteName: string;
  @Field(() => Float, { nullable: true }) expectedHundredths: number | null;
  @Field(() => Int) n: number;
  @Field(() => [HandicapHistoryModel]) used: HandicapHistoryModel[];
  @Field(() => Int, { nullable: true, description: 'Suggested seconds after "go"' }) suggestedSeconds: number | null;
  @Field(() => Int, { nullable: true, description: "The organiser's mark, when set" }) overrideSeconds: number | null;
  @Field(() => String) overrideNote: string;
  @Field(() => Int, { nullable: true, description: 'Override if set, else the suggestion' }) markSeconds: number | null;
  @Field(() => [String], { description: 'thin-history or no-history: needs the organiser’s judgement' }) flags: string[];
}

@ObjectType()
export class HandicapSheetModel {
  @Field(() => ID) meetEventId: string;
  @Field(() => ID) meetId: string;
  @Field(() => String) meetName: string;
  @Field(() => String) eventName: string;
  @Field(() => String) division: string;
  @Field(() => Float) blockDiameterMm: number;
  @Field(() => String) convention: string;
  @Field(() => String) note: string;
  @Field(() => [HandicapMarkModel], { description: 'Slowest (first to start) first' }) marks: HandicapMarkModel[];
}
