import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

import { EdgeKeennessEnum, TrialFlagEnum } from './trials.enums.js';
import { TrialHeadModel } from './trial-head.model.js';

@ObjectType('TrialRankingRow', { description: 'One axe in the verdict; depths in millimetres per counted swing' })
export class TrialRankingRowModel {
  @Field(() => ID)
  axeId: string;

  @Field(() => String)
  axeLabel: string;

  @Field(() => Boolean)
  isReference: boolean;

  @Field(() => TrialHeadModel, { nullable: true })
  head: TrialHeadModel | null;

  @Field(() => [String])
  testers: string[];

  @Field(() => Int)
  counted: number;

  @Field(() => Int)
  openingExcluded: number;

  @Field(() => Float, { nullable: true })
  meanMm: number | null;

  @Field(() => Float, { nullable: true, description: 'Sample standard deviation; null below two counted swings' })
  sdMm: number | null;

  @Field(() => Float, { nullable: true, description: 'Mean ÷ the reference axe mean, all testers pooled' })
  ratioToReference: number | null;

  @Field(() => Float, { nullable: true, description: 'The same ratio from only the testers who swung both axes' })
  sameTesterRatio: number | null;

  @Field(() => [String], { description: 'Testers of this axe who did not swing the reference axe' })
  testersWithoutReference: string[];

  @Field(() => Int, { nullable: true, description: 'Worst release step recorded' })
  releaseStep: number | null;

  @Field(() => EdgeKeennessEnum, { nullable: true, description: 'Worst keenness recorded' })
  keenness: EdgeKeennessEnum | null;

  @Field(() => Int, { nullable: true, description: 'Place by depth alone' })
  depthPlace: number | null;

  @Field(() => Int, { nullable: true, description: 'Place in the verdict: binding axes go after every axe that releases' })
  verdictPlace: number | null;

  @Field(() => [TrialFlagEnum])
  flags: TrialFlagEnum[];

  @Field(() => [String])
  notes: string[];
}

@ObjectType('TrialTesterMean')
export class TrialTesterMeanModel {
  @Field(() => ID)
  testerId: string;

  @Field(() => String)
  testerName: string;

  @Field(() => Int)
  counted: number;

  @Field(() => Float)
  meanMm: number;
}

@ObjectType('TrialTesterEffect', { description: 'One axe swung by two or more testers: how far their means differ' })
export class TrialTesterEffectModel {
  @Field(() => ID)
  axeId: string;

  @Field(() => String)
  axeLabel: string;

  @Field(() => [TrialTesterMeanModel], { description: 'Deepest first' })
  byTester: TrialTesterMeanModel[];

  @Field(() => Float, { nullable: true, description: 'Deepest mean ÷ shallowest; 1 means the testers agree; null when the shallowest is 0' })
  highToLowRatio: number | null;
}
