import { Field, ID, InputType, Int } from '@nestjs/graphql';

import { ClubRoleEnum, DivisionEnum, ExperienceEnum } from '../models/league.enums.js';

@InputType()
export class CreateSeasonInput {
  @Field(() => String)
  name: string;

  @Field(() => String)
  startsOn: string;

  @Field(() => String)
  endsOn: string;

  @Field(() => Boolean, { defaultValue: false })
  makeCurrent: boolean;
}

@InputType()
export class ClubInput {
  @Field(() => String)
  name: string;

  @Field(() => String)
  shortName: string;

  @Field(() => String)
  region: string;

  @Field(() => String, { nullable: true })
  contactEmail?: string | null;

  @Field(() => String, { nullable: true })
  colourPrimary?: string | null;

  @Field(() => String, { nullable: true })
  colourSecondary?: string | null;
}

@InputType()
export class AthleteInput {
  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  firstName: string;

  @Field(() => String)
  lastName: string;

  @Field(() => [DivisionEnum])
  divisions: DivisionEnum[];

  @Field(() => ExperienceEnum)
  experience: ExperienceEnum;

  @Field(() => Int, { nullable: true })
  firstSeasonYear?: number | null;
}

@InputType()
export class InviteToClubInput {
  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  email: string;

  @Field(() => ClubRoleEnum)
  role: ClubRoleEnum;
}
