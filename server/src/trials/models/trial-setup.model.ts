import { Field, Float, ID, ObjectType } from '@nestjs/graphql';

import { AxeStatusEnum, GrindEnum } from '../../rack/models/rack.enums.js';

@ObjectType('TrialAxeOption', { description: 'An axe of the rack the recorder can put on the block' })
export class TrialAxeOptionModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  label: string;

  @Field(() => GrindEnum)
  grind: GrindEnum;

  @Field(() => Float, { nullable: true })
  bevelIncludedDeg: number | null;

  @Field(() => Float, { nullable: true })
  chiselWidthMm: number | null;

  @Field(() => AxeStatusEnum)
  status: AxeStatusEnum;

  @Field(() => Boolean, { description: 'False for a loose head, a handle that needs replacing or a retired axe: it stays out of use' })
  usable: boolean;
}

@ObjectType('TrialAthleteOption')
export class TrialAthleteOptionModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  name: string;
}

@ObjectType('TrialSetup', { description: "What a club's coach picks from when recording a trial" })
export class TrialSetupModel {
  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => [TrialAxeOptionModel], { description: 'By label' })
  axes: TrialAxeOptionModel[];

  @Field(() => [TrialAthleteOptionModel], { description: 'The roster, by name' })
  athletes: TrialAthleteOptionModel[];
}
