import type { ExecutionContext } from '@nestjs/common';
import { GqlExecutionContext } from '@nestjs/graphql';
import type { Request } from 'express';

import type { AuthUser } from './auth-user.js';

export type EndgrainRequest = Request & { user?: AuthUser | null };

/** The HTTP request behind a GraphQL resolver or a REST handler. */
export function requestOf(context: ExecutionContext): EndgrainRequest {
  if (context.getType<string>() === 'graphql') {
    return GqlExecutionContext.create(context).getContext<{ req: EndgrainRequest }>().req;
  }
  return context.switchToHttp().getRequest<EndgrainRequest>();
}
