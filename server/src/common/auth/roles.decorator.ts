import { SetMetadata } from '@nestjs/common';
import { ROLES, type Role } from '@endgrain/shared';

export const REQUIRED_ROLES = 'endgrain:requiredRoles';

/** Requires a signed-in user with one of these roles (an admin always passes). */
export const Roles = (...roles: Role[]): MethodDecorator & ClassDecorator => SetMetadata(REQUIRED_ROLES, roles);

/** Any signed-in user, whatever the role. */
export const SignedIn = (): MethodDecorator & ClassDecorator => SetMetadata(REQUIRED_ROLES, [...ROLES]);
