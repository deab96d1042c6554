import { Inject } from '@nestjs/common';
import { Args, Context, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';
import type { EndgrainRequest } from '../common/auth/request-context.js';
import { SignedIn } from '../common/auth/roles.decorator.js';
import { UserModel } from '../users/models/user.model.js';
import { UsersService } from '../users/users.service.js';
import { AuthService } from './auth.service.js';
import { SignInInput } from './dto/sign-in.input.js';
import { SignUpInput } from './dto/sign-up.input.js';
import { AuthPayloadModel } from './models/auth-payload.model.js';

@Resolver()
export class AuthResolver {
  constructor(
    @Inject(AuthService) private readonly auth: AuthService,
    @Inject(UsersService) private readonly users: UsersService,
  ) {}

  @Query(() => UserModel, { nullable: true, description: 'The signed-in user, or null when signed out.' })
  @Public()
  me(@CurrentUser() user: AuthUser | null): Promise<UserModel> | null {
    return user ? this.users.getModel(user.id) : null;
  }

  @Mutation(() => AuthPayloadModel, { description: 'Create an account; a confirmation e-mail follows.' })
  @Public()
  signUp(@Args('input') input: SignUpInput): Promise<AuthPayloadModel> {
    return this.auth.signUp(input);
  }

  @Mutation(() => AuthPayloadModel)
  @Public()
  signIn(@Args('input') input: SignInInput, @Context('req') req: EndgrainRequest): Promise<AuthPayloadModel> {
    return this.auth.signIn(input, req.ip ?? 'unknown');
  }

  @Mutation(() => UserModel, { description: 'Confirm an e-mail address with the token from the e-mail.' })
  @Public()
  verifyEmail(@Args('token') token: string): Promise<UserModel> {
    return this.auth.verifyEmail(token);
  }

  @Mutation(() => Boolean)
  @SignedIn()
  resendVerification(@CurrentUser() user: AuthUser): Promise<boolean> {
    return this.auth.resendVerification(user.id);
  }

  @Mutation(() => Boolean, { description: 'Always true: it does not reveal whether the account exists.' })
  @Public()
  requestPasswordReset(@Args('email') email: string): Promise<boolean> {
    return this.auth.requestPasswordReset(email);
  }

  @Mutation(() => Boolean)
  @Public()
  resetPassword(@Args('token') token: string, @Args('password') password: string): Promise<boolean> {
    return this.auth.resetPassword(token, password);
  }
}
