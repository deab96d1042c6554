import { Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import nodemailer, { type Transporter } from 'nodemailer';

import { APP_CONFIG } from '../config/load-config.js';
import type { AppConfig } from '../config/env.schema.js';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** SMTP out through nodemailer: the local mail sink in development, a real server by SMTP_URL. */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private readonly transport: Transporter;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {
    this.transport = nodemailer.createTransport(config.SMTP_URL);
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.config.MAIL_FROM, ...mail });
    this.logger.log(`sent "${mail.subject}" to ${mail.to}`);
  }

  async isHealthy(): Promise<boolean> {
    try {
      return await this.transport.verify();
    } catch {
      return false;
    }
  }

  link(path: string): string {
    return new URL(path, this.config.PUBLIC_URL).toString();
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
