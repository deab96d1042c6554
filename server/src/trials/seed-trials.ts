import { randomUUID } from 'node:crypto';

import type { DataSource, EntityManager } from 'typeorm';

import { AthleteEntity } from '../league/entities/athlete.entity.js';
import { ClubEntity } from '../league/entities/club.entity.js';
import { AxeEntity } from '../rack/entities/axe.entity.js';
import { TrialRunEntity } from './entities/trial-run.entity.js';
import { TrialSummaryEntity } from './entities/trial-summary.entity.js';
import { TrialTesterEntity } from './entities/trial-tester.entity.js';
import { TrialEntity } from './entities/trial.entity.js';
import { DEMO_TRIALS, seedSwings, type SeedTrial } from './seed-trials-data.js';
import { trialFinding } from './trial-finding.js';
import { toTrialModel } from './trials.mappers.js';

/**
 * Writes the demo trials to the clubs found by short name (given `only`, short name → club id, to
 * just those). Needs the club's demo rack; a club that already has trials, or lacks an axe a trial
 * uses, is left alone. Published ones get the stored summary the Grain Map reads (no Field Note is
 * opened for them). Answers how many trials were added.
 */
export async function seedTrials(db: DataSource | EntityManager, only?: Record<string, string>): Promise<number> {
  let added = 0;
  for (const [shortName, trials] of Object.entries(DEMO_TRIALS)) {
    const clubId = only ? only[shortName] : (await db.getRepository(ClubEntity).findOneBy({ shortName }))?.id;
    if (!clubId || (await db.getRepository(TrialEntity).countBy({ clubId })) > 0) continue;
    const axes = new Map((await db.getRepository(AxeEntity).findBy({ clubId })).map((a) => [a.label, a]));
    if (!trials.every((t) => [t.reference, ...t.runs.map((r) => r.axe)].every((label) => axes.has(label)))) continue;
    const roster = await db.getRepository(AthleteEntity).find({ where: { clubId }, order: { lastName: 'ASC', firstName: 'ASC', id: 'ASC' } });
    for (const trial of trials) {
      await insertTrial(db, clubId, trial, axes, roster);
      added += 1;
    }
  }
  return added;
}

async function insertTrial(db: DataSource | EntityManager, clubId: string, seed: SeedTrial, axes: Map<string, AxeEntity>, roster: AthleteEntity[]): Promise<void> {
  const id = randomUUID();
  const { testers: testerPositions, runs, reference, published, ...columns } = seed;
  await db.getRepository(TrialEntity).insert({ id, clubId, ...columns, referenceAxeId: axes.get(reference)!.id, version: 1, saveToken: null, recordedBy: null });
  const testers = testerPositions.map((p, position) => {
    const athlete = roster[p % Math.max(1, roster.length)];
    return { id: randomUUID(), trialId: id, athleteId: athlete?.id ?? null, name: athlete ? `${athlete.firstName} ${athlete.lastName}` : `Tester ${position + 1}`, position };
  });
  await db.getRepository(TrialTesterEntity).insert(testers);
  await db.getRepository(TrialRunEntity).insert(
    runs.map((r, position) => {
      const axe = axes.get(r.axe)!;
      return {
        id: randomUUID(),
        trialId: id,
        position,
        axeId: axe.id,
        testerId: testers[r.tester]!.id,
        swings: seedSwings(r.meanMm, position),
        releaseStep: r.release,
        keenness: r.keenness,
        feel: r.feel,
        notes: '',
        grind: axe.grind,
        bevelIncludedDeg: axe.bevelIncludedDeg,
        chiselWidthMm: axe.chiselWidthMm,
      };
    }),
  );
  if (published) await publishSummary(db, id, seed.testedOn);
}

async function publishSummary(db: DataSource | EntityManager, trialId: string, testedOn: string): Promise<void> {
  const trial = await db.getRepository(TrialEntity).findOneOrFail({ where: { id: trialId }, relations: { club: true, referenceAxe: true, testers: true, runs: { axe: true } } });
  const draft = trialFinding(toTrialModel(trial, { canEdit: false, summary: null }));
  const { speciesId, condition, grinds, title, summary, bodyMarkdown } = draft;
  await db.getRepository(TrialSummaryEntity).insert({
    trialId, title, summary, bodyMarkdown, speciesId, condition, grinds, articleId: null, articleSlug: null, publishedBy: null,
    // Published the evening of the test (fixed, so the demo reads the same every time).
    publishedAt: new Date(`${testedOn}T18:00:00Z`),
  });
}
