import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';

import type { AuthUser, JwtClaims } from '../common/auth/auth-user.js';
import { UsersRepository } from '../users/users.repository.js';

/** Turns a bearer token into the current user, read fresh from the database (no server state). */
@Injectable()
export class TokenVerifier {
  constructor(
    @Inject(JwtService) private readonly jwt: JwtService,
    @Inject(UsersRepository) private readonly users: UsersRepository,
  ) {}

  sign(userId: string, tokenVersion: number): Promise<string> {
    const claims: JwtClaims = { sub: userId, tv: tokenVersion };
    return this.jwt.signAsync(claims);
  }

  async userFromHeader(header: string | undefined): Promise<AuthUser | null> {
    const match = /^Bearer\s+(\S+)$/i.exec(header ?? '');
    if (!match?.[1]) return null;
    let claims: JwtClaims;
    try {
      claims = await this.jwt.verifyAsync<JwtClaims>(match[1]);
    } catch {
      return null;
    }
    const user = await this.users.findById(claims.sub);
    if (!user || user.tokenVersion !== claims.tv) return null;
    return {
      id: user.id,
      email: user.email,
      role: user.role,
      clubIds: (user.memberships ?? []).map((m) => m.clubId),
    };
  }
}
