import { Field, ID, InputType } from '@nestjs/graphql';

@InputType()
export class AssignLineupInput {
  @Field(() => ID)
  entryId: string;

  @Field(() => ID, { nullable: true, description: "One of the entry's athletes; may be left out when the entry has one" })
  athleteId?: string | null;

  @Field(() => ID, { nullable: true, description: 'An axe from the same club; leave out for events without a head' })
  axeId?: string | null;

  @Field(() => String, { nullable: true, description: "Why an axe goes to an athlete below its experience rule (recorded)" })
  overrideReason?: string | null;
}
