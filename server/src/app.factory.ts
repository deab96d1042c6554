import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';

import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { NextFunction, Request, Response } from 'express';
import helmet from 'helmet';

import { AppModule } from './app.module.js';
import { APP_CONFIG } from './config/load-config.js';
import type { AppConfig } from './config/env.schema.js';

const API_PREFIXES = ['/graphql', '/api', '/health'];

/** Builds the whole app (used by main.ts and the end-to-end tests). */
export async function createApp(options: { logger?: boolean } = {}): Promise<NestExpressApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    logger: options.logger === false ? false : ['error', 'warn', 'log'],
  });
  const config = app.get<AppConfig>(APP_CONFIG);
  app.set('trust proxy', config.TRUST_PROXY);
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'connect-src': ["'self'", config.SEARCH_URL],
          'font-src': ["'self'", 'data:'],
          'upgrade-insecure-requests': null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  serveClient(app, config);
  app.enableShutdownHooks();
  return app;
}

/** The built client, with every non-API path answered by index.html (client-side routes). */
function serveClient(app: NestExpressApplication, config: AppConfig): void {
  const dist = resolve(config.CLIENT_DIST ?? join(import.meta.dirname, '../../client/dist'));
  if (!existsSync(join(dist, 'index.html'))) return;
  app.useStaticAssets(dist, { index: false, maxAge: '1h' });
  app.use((req: Request, res: Response, next: NextFunction) => {
    if (req.method !== 'GET' || API_PREFIXES.some((p) => req.path.startsWith(p))) return next();
    res.sendFile(join(dist, 'index.html'));
  });
}
