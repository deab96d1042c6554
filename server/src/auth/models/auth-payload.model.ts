import { Field, ObjectType } from '@nestjs/graphql';

import { UserModel } from '../../users/models/user.model.js';

@ObjectType('AuthPayload')
export class AuthPayloadModel {
  @Field(() => String, { description: 'Send as "Authorization: Bearer <token>".' })
  accessToken: string;

  @Field(() => UserModel)
  user: UserModel;
}
