import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import bcrypt from 'bcryptjs';
import { normaliseEmail, passwordProblem } from '@endgrain/shared';
import { DataSource } from 'typeorm';

import { DomainError } from '../common/errors/domain-error.js';
import { ErrorCode } from '../common/errors/error-code.js';
import { MailService } from '../mail/mail.service.js';
import { UserEntity } from '../users/entities/user.entity.js';
import type { UserModel } from '../users/models/user.model.js';
import { toUserModel } from '../users/user.mapper.js';
import { UsersRepository } from '../users/users.repository.js';
import { validDisplayName } from '../users/users.service.js';
import { resetMail, verificationMail } from './auth-mails.js';
import type { SignInInput } from './dto/sign-in.input.js';
import type { SignUpInput } from './dto/sign-up.input.js';
import { EmailTokensService } from './email-tokens.service.js';
import type { AuthPayloadModel } from './models/auth-payload.model.js';
import { SignInThrottle } from './sign-in-throttle.js';
import { TokenVerifier } from './token-verifier.js';

const BCRYPT_ROUNDS = 11;
const UNIFORM_FAILURE = 'E-mail or password is not right.';
// Compared against when the account does not exist, so both failures take as long.
const DUMMY_HASH = bcrypt.hashSync('endgrain-no-such-account', BCRYPT_ROUNDS);

@Injectable()
export class AuthService {
  constructor(
    @Inject(DataSource) private readonly db: DataSource,
    @Inject(UsersRepository) private readonly users: UsersRepository,
    @Inject(TokenVerifier) private readonly tokens: TokenVerifier,
    @Inject(EmailTokensService) private readonly emailTokens: EmailTokensService,
    @Inject(SignInThrottle) private readonly throttle: SignInThrottle,
    @Inject(MailService) private readonly mail: MailService,
  ) {}

  async signUp(input: SignUpInput): Promise<AuthPayloadModel> {
    const email = normaliseEmail(input.email ?? '');
    if (!email) throw DomainError.badInput('email', 'Enter a valid e-mail address.');
    const displayName = validDisplayName(input.displayName ?? '');
    const problem = passwordProblem(input.password ?? '', { email });
    if (problem) throw DomainError.badInput('password', problem);
    if (await this.users.findByEmail(email)) {
      throw new DomainError(ErrorCode.EmailTaken, 'An account with that e-mail already exists. Sign in instead.', {
        field: 'email',
      });
    }
    const user = this.users.create({
      id: randomUUID(),
      email,
      displayName,
      passwordHash: await bcrypt.hash(input.password, BCRYPT_ROUNDS),
      role: 'ATHLETE',
      emailVerifiedAt: null,
      unitSystem: 'METRIC',
      tokenVersion: 0,
    });
    await this.users.save(user);
    await this.sendVerification(user);
    return this.payload(user.id);
  }

  async signIn(input: SignInInput, ip: string): Promise<AuthPayloadModel> {
    const email = normaliseEmail(input.email ?? '') ?? (input.email ?? '').trim().toLowerCase();
    await this.throttle.consume(ip, email);
    const user = await this.users.findByEmail(email);
    const matches = await bcrypt.compare(input.password ?? '', user?.passwordHash ?? DUMMY_HASH);
    if (!user || !matches) throw new DomainError(ErrorCode.InvalidCredentials, UNIFORM_FAILURE);
    await this.throttle.succeeded(email);
    return this.payload(user.id);
  }

  async verifyEmail(token: string): Promise<UserModel> {
    const userId = await this.db.transaction(async (manager) => {
      const id = await this.emailTokens.redeem(manager, token, 'VERIFY_EMAIL');
      await manager.getRepository(UserEntity).update({ id }, { emailVerifiedAt: new Date() });
      return id;
    });
    return toUserModel((await this.users.findById(userId))!);
  }

  async resendVerification(userId: string): Promise<boolean> {
    const user = await this.users.findById(userId);
    if (!user) throw DomainError.notFound('That account');
    if (user.emailVerifiedAt) throw DomainError.badInput('email', 'Your e-mail address is already confirmed.');
    await this.sendVerification(user);
    return true;
  }

  /** Always answers true, so the form cannot be used to learn who has an account. */
  async requestPasswordReset(rawEmail: string): Promise<boolean> {
    const email = normaliseEmail(rawEmail ?? '');
    if (!email) throw DomainError.badInput('email', 'Enter a valid e-mail address.');
    const user = await this.users.findByEmail(email);
    if (user) {
      const token = await this.emailTokens.issue(user.id, 'RESET_PASSWORD');
      const link = this.mail.link(`/reset-password?token=${encodeURIComponent(token)}`);
      await this.mail.send(resetMail(user.email, user.displayName, link));
    }
    return true;
  }

  async resetPassword(token: string, password: string): Promise<boolean> {
    await this.db.transaction(async (manager) => {
      const userId = await this.emailTokens.redeem(manager, token, 'RESET_PASSWORD');
      const repo = manager.getRepository(UserEntity);
      const user = await repo.findOneByOrFail({ id: userId });
      const problem = passwordProblem(password ?? '', { email: user.email });
      if (problem) throw DomainError.badInput('password', problem);
      user.passwordHash = await bcrypt.hash(password, BCRYPT_ROUNDS);
      user.tokenVersion += 1; // sign out every other device
      user.emailVerifiedAt ??= new Date(); // the link proved the address
      await repo.save(user);
    });
    return true;
  }

  private async sendVerification(user: UserEntity): Promise<void> {
    const token = await this.emailTokens.issue(user.id, 'VERIFY_EMAIL');
    const link = this.mail.link(`/verify-email?token=${encodeURIComponent(token)}`);
    await this.mail.send(verificationMail(user.email, user.displayName, link));
  }

  private async payload(userId: string): Promise<AuthPayloadModel> {
    const user = (await this.users.findById(userId))!;
    return { accessToken: await this.tokens.sign(user.id, user.tokenVersion), user: toUserModel(user) };
  }
}
