import { DEMO_MEETS } from '@endgrain/seeds';
import { HEAD_GRINDS, seededRandom, type BlockCondition } from '@endgrain/shared';
import type { DataSource } from 'typeorm';

import { EntryEntity } from '../meets/entities/entry.entity.js';
import { MeetEntity } from '../meets/entities/meet.entity.js';
import type { AxeSetup } from './posted-from-input.js';
import type { PostedResult } from './posted-result.js';
import { ResultsReadRepository } from './results-read.repository.js';
import { ResultsWriter, type ResultChange } from './results-writer.js';
import { ResultsRepository } from './results.repository.js';

// Invented typical times in hundredths for the demo's events (common practice for collegiate
// blocks of these sizes, from memory): a fast chop of a 12-inch pine block is well under a minute.
const TYPICAL: Record<string, number> = {
  'underhand-chop': 3400, 'standing-block-chop': 4200, 'single-buck': 2600, 'mixed-double-buck': 1500, springboard: 9000,
};
const CONDITIONS: BlockCondition[] = ['SEASONED', 'SEASONED', 'GREEN', 'DRY', 'KNOTTY'];
const DQ_REASONS = ['chopped below the foot line', 'started before the call', 'axe left unguarded in the clear zone'];

/**
 * Posts invented results for the demo's closed meet and publishes it, through the same writer
 * the API uses (so places, points and standings are computed as for real). Deterministic:
 * one seeded generator, entries in draw order. Uses the club's rack axes when the Rack has
 * them, otherwise typed setups. Returns false when the meet is missing, not closed, or has results
 * already. `meetId` seeds another closed meet instead (tests).
 */
export async function seedResults(db: DataSource, options: { meetId?: string; seed?: number } = {}): Promise<boolean> {
  const demo = DEMO_MEETS.find((m) => m.status === 'CLOSED');
  const where = options.meetId ? { id: options.meetId } : demo ? { name: demo.name } : null;
  const meet = where ? await db.getRepository(MeetEntity).findOneBy(where) : null;
  if (!meet || meet.status !== 'CLOSED') return false;
  const repo = new ResultsRepository(db);
  const read = new ResultsReadRepository(db);
  if ((await read.resultsOfMeet(meet.id)).length > 0) return false;
  const entries = await db.getRepository(EntryEntity).find({
    where: { meetEvent: { meetId: meet.id } },
    relations: { meetEvent: { eventType: true } },
    order: { meetEventId: 'ASC', drawPosition: 'ASC', id: 'ASC' },
  });
  const axes = await read.axesOfClubs([...new Set(entries.map((e) => e.clubId))]);
  const random = seededRandom(options.seed ?? 20261017);
  const changes = entries.map((entry) => demoResult(entry, axes.filter((a) => a.clubId === entry.clubId), Array.from({ length: 10 }, random)));
  await db.transaction(async (m) => {
    const locked = (await repo.lockMeet(m, meet.id))!;
    await new ResultsWriter(repo).write(m, locked, changes, { userId: meet.createdBy ?? null, action: 'RECORDED', reason: 'demo results' });
    await repo.setMeetStatus(m, meet.id, 'PUBLISHED');
  });
  return true;
}

/** One entry's invented result from ten random draws, the same count whatever the branch. */
function demoResult(entry: EntryEntity, clubAxes: readonly AxeSetup[], r: number[]): ResultChange {
  const [roll, axeDraw, grindDraw, bevelDraw, chiselDraw, conditionDraw, scoreDraw, timeDraw, watchDraw, reasonDraw] = r as [number, number, number, number, number, number, number, number, number, number];
  const pick = <T>(items: readonly T[], draw: number): T => items[Math.floor(draw * items.length)]!;
  const event = entry.meetEvent;
  const type = event.eventType;
  const axe = type.usesHead && clubAxes.length ? pick(clubAxes, axeDraw) : null;
  const typed = type.usesHead && !axe;
  const base: PostedResult = {
    status: 'FINISHED', dqReason: null, rawTimes: [], score: null, penaltyHundredths: 0, runOffRank: null,
    axeId: axe?.id ?? null, axeLabel: axe?.label ?? null, grind: axe?.grind ?? (typed ? pick(HEAD_GRINDS, grindDraw) : null),
    bevelIncludedDeg: axe?.bevelIncludedDeg ?? (typed ? 26 + Math.round(bevelDraw * 10) : null),
    chiselWidthMm: axe?.chiselWidthMm ?? (typed ? 3 + Math.round(chiselDraw * 9) : null),
    speciesId: event.speciesId, diameterMm: event.diameterMm, blockCondition: event.speciesId ? pick(CONDITIONS, conditionDraw) : null,
  };
  if (roll < 0.06) return { entry, posted: { ...base, status: 'SCRATCH' } };
  if (type.resultKind !== 'TIMED') return { entry, posted: { ...base, score: Math.floor(6 + scoreDraw * 20) } };
  const time = Math.round((TYPICAL[type.code] ?? 4000) * (0.85 + timeDraw * 0.45));
  const watches = [time, time + Math.round(watchDraw * 16) - 8];
  if (roll < 0.1) return { entry, posted: { ...base, status: 'DISQUALIFIED', dqReason: pick(DQ_REASONS, reasonDraw), rawTimes: watches } };
  return { entry, posted: { ...base, rawTimes: watches, penaltyHundredths: roll > 0.93 ? 500 : 0 } };
}
