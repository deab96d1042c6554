import { createParamDecorator, type ExecutionContext } from '@nestjs/common';

import type { AuthUser } from './auth-user.js';
import { requestOf } from './request-context.js';

/** The signed-in user, or null on a public operation called while signed out. */
export const CurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): AuthUser | null => requestOf(context).user ?? null,
);
