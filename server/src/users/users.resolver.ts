import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Roles, SignedIn } from '../common/auth/roles.decorator.js';
import { RoleEnum, UnitSystemEnum, UserModel } from './models/user.model.js';
import { UsersService } from './users.service.js';

@Resolver(() => UserModel)
export class UsersResolver {
  constructor(@Inject(UsersService) private readonly users: UsersService) {}

  @Query(() => [UserModel], { name: 'users', description: 'Every account (admins only).' })
  @Roles('ADMIN')
  users_(): Promise<UserModel[]> {
    return this.users.list();
  }

  @Mutation(() => UserModel, { description: 'Change an account role (admins only).' })
  @Roles('ADMIN')
  setUserRole(
    @CurrentUser() actor: AuthUser,
    @Args('userId', { type: () => ID }) userId: string,
    @Args('role', { type: () => RoleEnum }) role: RoleEnum,
  ): Promise<UserModel> {
    return this.users.setRole(actor.id, userId, role);
  }

  @Mutation(() => UserModel, { description: 'Change your own display name or units.' })
  @SignedIn()
  updateMyPreferences(
    @CurrentUser() actor: AuthUser,
    @Args('displayName', { type: () => String, nullable: true }) displayName?: string | null,
    @Args('unitSystem', { type: () => UnitSystemEnum, nullable: true }) unitSystem?: UnitSystemEnum | null,
  ): Promise<UserModel> {
    return this.users.updatePreferences(actor.id, { displayName, unitSystem });
  }
}
