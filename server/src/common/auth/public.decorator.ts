import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'endgrain:isPublic';

/** Opens a resolver or route to signed-out visitors. Everything else is denied by default. */
export const Public = (): MethodDecorator & ClassDecorator => SetMetadata(IS_PUBLIC, true);
