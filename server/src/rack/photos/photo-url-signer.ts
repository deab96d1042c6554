import { createHmac, timingSafeEqual } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';

import { APP_CONFIG } from '../../config/load-config.js';
import type { AppConfig } from '../../config/env.schema.js';

export const PHOTO_ROUTE = '/api/rack/photos';
const HOUR_S = 3600;

/**
 * Signed photo links: an <img> cannot send the bearer token, so the GraphQL answer to a
 * member carries a link that works for one to two hours. Expiry is rounded to the hour so
 * the same link (and the browser's cached copy) serves a whole page session.
 */
@Injectable()
export class PhotoUrlSigner {
  private readonly key: Buffer;

  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    this.key = createHmac('sha256', config.JWT_SECRET).update('endgrain:rack-photo').digest();
  }

  url(photoId: string, options: { signed: boolean; now?: Date }): string {
    const base = `${PHOTO_ROUTE}/${photoId}`;
    if (!options.signed) return base;
    const exp = (Math.floor((options.now ?? new Date()).getTime() / 1000 / HOUR_S) + 2) * HOUR_S;
    return `${base}?exp=${exp}&sig=${this.signature(photoId, exp)}`;
  }

  verify(photoId: string, exp: string | undefined, sig: string | undefined, now = new Date()): boolean {
    if (!exp || !sig || !/^\d{1,12}$/.test(exp) || !/^[0-9a-f]{64}$/.test(sig)) return false;
    if (Number(exp) * 1000 < now.getTime()) return false;
    return timingSafeEqual(Buffer.from(this.signature(photoId, Number(exp)), 'hex'), Buffer.from(sig, 'hex'));
  }

  private signature(photoId: string, exp: number): string {
    return createHmac('sha256', this.key).update(`${photoId}.${exp}`).digest('hex');
  }
}
