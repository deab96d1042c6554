import { Inject, Injectable, type OnModuleDestroy } from '@nestjs/common';
import mysql from 'mysql2';
import { RateLimiterMySQL, RateLimiterRes } from 'rate-limiter-flexible';

import { APP_CONFIG } from '../config/load-config.js';
import type { AppConfig } from '../config/env.schema.js';
import { DomainError } from '../common/errors/domain-error.js';
import { ErrorCode } from '../common/errors/error-code.js';

/**
 * Sign-in attempts counted per IP and per account in MariaDB, so the limit holds across
 * every server instance. A successful sign-in clears the account's count.
 */
@Injectable()
export class SignInThrottle implements OnModuleDestroy {
  private readonly pool: mysql.Pool;
  private readonly perIp: RateLimiterMySQL;
  private readonly perAccount: RateLimiterMySQL;

  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    this.pool = mysql.createPool({
      host: config.DB_HOST,
      port: config.DB_PORT,
      user: config.DB_USER,
      password: config.DB_PASSWORD,
      database: config.DB_NAME,
      connectionLimit: 3,
    });
    const common = {
      storeClient: this.pool,
      storeType: 'pool',
      dbName: config.DB_NAME,
      tableName: 'rate_limits',
      tableCreated: true,
      clearExpiredByTimeout: false,
      duration: config.SIGN_IN_WINDOW_SECONDS,
    };
    this.perIp = new RateLimiterMySQL({ ...common, keyPrefix: 'signin-ip', points: config.SIGN_IN_LIMIT_PER_IP });
    this.perAccount = new RateLimiterMySQL({
      ...common,
      keyPrefix: 'signin-account',
      points: config.SIGN_IN_LIMIT_PER_ACCOUNT,
    });
  }

  async consume(ip: string, email: string): Promise<void> {
    try {
      await Promise.all([this.perIp.consume(ip), this.perAccount.consume(email)]);
    } catch (error) {
      if (error instanceof RateLimiterRes) {
        const seconds = Math.max(1, Math.ceil(error.msBeforeNext / 1000));
        throw new DomainError(
          ErrorCode.TooManyAttempts,
          `Too many sign-in attempts. Try again in ${humanWait(seconds)}.`,
          { retryAfterSeconds: seconds },
        );
      }
      throw error;
    }
  }

  async succeeded(email: string): Promise<void> {
    await this.perAccount.delete(email);
  }

  onModuleDestroy(): Promise<void> {
    return new Promise((resolve) => this.pool.end(() => resolve()));
  }
}

function humanWait(seconds: number): string {
  return seconds < 90 ? `${seconds} seconds` : `${Math.ceil(seconds / 60)} minutes`;
}
