import { randomUUID } from 'node:crypto';

import bcrypt from 'bcryptjs';
import { DEMO_ACCOUNTS, DEMO_CLUBS, DEMO_SEASON, demoAthletes } from '@endgrain/seeds';
import type { DataSource } from 'typeorm';

import { AthleteEntity } from '../league/entities/athlete.entity.js';
import { ClubEntity } from '../league/entities/club.entity.js';
import { SeasonEntity } from '../league/entities/season.entity.js';
import { ClubMembershipEntity } from '../users/entities/club-membership.entity.js';
import { UserEntity } from '../users/entities/user.entity.js';
import { seedMeets } from './seed-meets.js';

/** Writes the invented demo league in one transaction. Returns false when data already exist. */
export async function seedDemo(db: DataSource, demoPassword: string): Promise<boolean> {
  if ((await db.getRepository(UserEntity).count()) > 0) return false;
  const passwordHash = await bcrypt.hash(demoPassword, 10);
  await db.transaction(async (m) => {
    await m.getRepository(SeasonEntity).insert({ id: randomUUID(), ...DEMO_SEASON, isCurrent: true });
    const clubIds = new Map<string, string>();
    for (const { key, ...club } of DEMO_CLUBS) {
      const id = randomUUID();
      clubIds.set(key, id);
      await m.getRepository(ClubEntity).insert({ id, ...club });
    }
    const athleteIds = new Map<string, string>();
    const athletes = demoAthletes().map(({ key, clubKey, ...a }) => {
      const id = randomUUID();
      athleteIds.set(key, id);
      return { id, clubId: clubIds.get(clubKey)!, userId: null, ...a };
    });
    await m.getRepository(AthleteEntity).insert(athletes);
    for (const account of DEMO_ACCOUNTS) {
      const id = randomUUID();
      await m.getRepository(UserEntity).insert({
        id,
        email: account.email,
        displayName: account.displayName,
        role: account.role,
        passwordHash,
        emailVerifiedAt: new Date(),
        unitSystem: 'METRIC',
        tokenVersion: 0,
      });
      if (account.clubKey && (account.role === 'COACH' || account.role === 'ATHLETE')) {
        await m.getRepository(ClubMembershipEntity).insert({
          id: randomUUID(),
          userId: id,
          clubId: clubIds.get(account.clubKey)!,
          role: account.role,
        });
      }
      if (account.athleteKey) {
        await m.getRepository(AthleteEntity).update({ id: athleteIds.get(account.athleteKey)! }, { userId: id });
      }
    }
    await seedMeets(m, clubIds);
  });
  return true;
}
