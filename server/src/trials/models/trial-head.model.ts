import { Field, Float, ObjectType } from '@nestjs/graphql';

import { GrindEnum } from '../../rack/models/rack.enums.js';

@ObjectType('TrialHead', { description: 'The head setup of the axe on the day of the trial' })
export class TrialHeadModel {
  @Field(() => GrindEnum)
  grind: GrindEnum;

  @Field(() => Float, { nullable: true, description: 'Included angle across both faces, degrees' })
  bevelIncludedDeg: number | null;

  @Field(() => Float, { nullable: true, description: 'Millimetres' })
  chiselWidthMm: number | null;
}
