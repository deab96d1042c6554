import { Field, ID, Int, ObjectType } from '@nestjs/graphql';

import { DivisionEnum, ExperienceEnum } from './league.enums.js';

@ObjectType('Athlete')
export class AthleteModel {
  @Field(() => ID)
  id: string;

  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => String)
  firstName: string;

  @Field(() => String)
  lastName: string;

  @Field(() => String)
  name: string;

  @Field(() => [DivisionEnum])
  divisions: DivisionEnum[];

  @Field(() => ExperienceEnum)
  experience: ExperienceEnum;

  @Field(() => Int, { nullable: true })
  firstSeasonYear: number | null;

  @Field(() => Boolean, { description: 'Linked to a user account' })
  hasAccount: boolean;
}
