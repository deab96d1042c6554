import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

import { ResultKindEnum } from './meets.enums.js';

@ObjectType('Penalty')
export class PenaltyModel {
  @Field(() => String)
  label: string;

  @Field(() => Float)
  seconds: number;
}

@ObjectType('DivisionDiameter')
export class DivisionDiameterModel {
  @Field(() => String)
  division: string;

  @Field(() => Float)
  diameterMm: number;
}

@ObjectType('EventType')
export class EventTypeModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  code: string;

  @Field(() => String)
  name: string;

  @Field(() => ResultKindEnum)
  resultKind: ResultKindEnum;

  @Field(() => Int)
  teamSize: number;

  @Field(() => Boolean)
  mixedPair: boolean;

  @Field(() => Boolean)
  usesHead: boolean;

  @Field(() => [DivisionDiameterModel])
  defaultDiameters: DivisionDiameterModel[];

  @Field(() => [PenaltyModel])
  defaultPenalties: PenaltyModel[];

  @Field(() => String)
  description: string;
}
