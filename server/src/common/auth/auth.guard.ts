import { Inject, Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { isAllowed, type Role } from '@endgrain/shared';

import { DomainError } from '../errors/domain-error.js';
import { ErrorCode } from '../errors/error-code.js';
import { TokenVerifier } from '../../auth/token-verifier.js';
import { IS_PUBLIC } from './public.decorator.js';
import { requestOf } from './request-context.js';
import { REQUIRED_ROLES } from './roles.decorator.js';

/**
 * Global default-deny guard: an operation runs only when it is marked @Public() or
 * names the roles it needs and the caller holds one of them.
 */
@Injectable()
export class AuthGuard implements CanActivate {
  constructor(
    @Inject(Reflector) private readonly reflector: Reflector,
    @Inject(TokenVerifier) private readonly tokens: TokenVerifier,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    const isPublic = this.reflector.getAllAndOverride<boolean | undefined>(IS_PUBLIC, targets) === true;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(REQUIRED_ROLES, targets);
    const request = requestOf(context);
    if (request.user === undefined) request.user = await this.tokens.userFromHeader(request.headers.authorization);
    if (isPublic) return true;
    if (!roles) throw DomainError.forbidden('This operation is not open to anyone.');
    if (!request.user) throw new DomainError(ErrorCode.Unauthenticated, 'Please sign in first.');
    if (!isAllowed(request.user, roles)) throw DomainError.forbidden();
    return true;
  }
}
