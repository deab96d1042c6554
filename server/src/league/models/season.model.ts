import { Field, ID, ObjectType } from '@nestjs/graphql';

@ObjectType('Season')
export class SeasonModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  name: string;

  @Field(() => String, { description: 'ISO date' })
  startsOn: string;

  @Field(() => String, { description: 'ISO date' })
  endsOn: string;

  @Field(() => Boolean)
  isCurrent: boolean;
}
