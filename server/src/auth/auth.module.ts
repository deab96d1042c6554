import { Global, Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';

import { AuthGuard } from '../common/auth/auth.guard.js';
import { APP_CONFIG } from '../config/load-config.js';
import type { AppConfig } from '../config/env.schema.js';
import { UsersModule } from '../users/users.module.js';
import { AuthResolver } from './auth.resolver.js';
import { AuthService } from './auth.service.js';
import { EmailTokensService } from './email-tokens.service.js';
import { SignInThrottle } from './sign-in-throttle.js';
import { TokenVerifier } from './token-verifier.js';

@Global()
@Module({
  imports: [
    UsersModule,
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({
        secret: config.JWT_SECRET,
        signOptions: { expiresIn: config.JWT_TTL as `${number}h`, issuer: 'endgrain' },
        verifyOptions: { issuer: 'endgrain' },
      }),
    }),
  ],
  providers: [
    AuthService,
    AuthResolver,
    EmailTokensService,
    SignInThrottle,
    TokenVerifier,
    { provide: APP_GUARD, useClass: AuthGuard },
  ],
  exports: [TokenVerifier, EmailTokensService],
})
export class AuthModule {}
