import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

import { TrialHeadModel } from './trial-head.model.js';
import { TrialConditionEnum, TrialFlagEnum } from './trials.enums.js';

@ObjectType('AxeTrial', { description: "One trial an axe took part in, with that axe's row of the verdict" })
export class AxeTrialModel {
  @Field(() => ID)
  trialId: string;

  @Field(() => String, { description: 'ISO date' })
  testedOn: string;

  @Field(() => String)
  speciesId: string;

  @Field(() => TrialConditionEnum)
  condition: TrialConditionEnum;

  @Field(() => String)
  woodLabel: string;

  @Field(() => Float)
  diameterMm: number;

  @Field(() => Int)
  axeCount: number;

  @Field(() => Boolean)
  isReference: boolean;

  @Field(() => Int, { nullable: true })
  verdictPlace: number | null;

  @Field(() => Float, { nullable: true })
  meanMm: number | null;

  @Field(() => Float, { nullable: true })
  ratioToReference: number | null;

  @Field(() => Int, { nullable: true })
  releaseStep: number | null;

  @Field(() => [TrialFlagEnum])
  flags: TrialFlagEnum[];

  @Field(() => TrialHeadModel, { nullable: true })
  head: TrialHeadModel | null;
}
