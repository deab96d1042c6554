import { Inject, Injectable, Logger } from '@nestjs/common';
import { meetStatusProblem } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { MailService } from '../mail/mail.service.js';
import { MeetsRepository } from '../meets/meets.repository.js';
import type { PublishResultsPayload } from './models/result.model.js';
import { placingsMail } from './publish-mail.js';
import { ResultsReadRepository } from './results-read.repository.js';
import { ResultsRepository } from './results.repository.js';
import { ResultsService } from './results.service.js';
import { StandingsService } from './standings.service.js';

/** Publishing a meet's results: checks they are complete, opens them to everyone, mails the coaches. */
@Injectable()
export class PublishService {
  private readonly logger = new Logger('Results');

  constructor(
    @Inject(MeetsRepository) private readonly meetsRepo: MeetsRepository,
    @Inject(ResultsRepository) private readonly repo: ResultsRepository,
    @Inject(ResultsReadRepository) private readonly read: ResultsReadRepository,
    @Inject(ResultsService) private readonly resultsService: ResultsService,
    @Inject(StandingsService) private readonly standingsService: StandingsService,
    @Inject(MailService) private readonly mail: MailService,
  ) {}

  async publish(actor: AuthUser, meetId: string): Promise<PublishResultsPayload> {
    await this.repo.db.transaction(async (m) => {
      const meet = await this.repo.lockMeet(m, meetId);
      if (!meet) throw DomainError.notFound('That meet');
      const problem = meetStatusProblem(meet.status, 'PUBLISHED');
      if (problem) throw DomainError.badInput('meetId', problem);
      const [entries, results] = await Promise.all([this.meetsRepo.entriesOfMeet(meetId), this.read.resultsOfMeet(meetId)]);
      const done = new Set(results.map((r) => r.entryId));
      const missing = entries.filter((e) => !done.has(e.id));
      if (missing.length) {
        throw DomainError.badInput('meetId', `${missing.length} ${missing.length === 1 ? 'entry has' : 'entries have'} no result yet; record a scratch for anyone who did not run.`);
      }
      if (results.length === 0) throw DomainError.badInput('meetId', 'There are no results to publish yet.');
      if (results.some((r) => r.provisional)) throw DomainError.badInput('meetId', 'A tie is waiting for its run-off; record the run-off order first.');
      await this.repo.setMeetStatus(m, meetId, 'PUBLISHED');
    });
    const coachesMailed = await this.mailCoaches(actor, meetId);
    return { meet: await this.resultsService.meetResults(actor, meetId), coachesMailed };
  }

  /** After the commit: a mail that fails is logged, and the results stay published. */
  private async mailCoaches(actor: AuthUser, meetId: string): Promise<number> {
    const page = await this.resultsService.meetResults(actor, meetId);
    const results = page.events.flatMap((e) => e.results);
    const clubs = new Map(results.map((r) => [r.clubId, r.clubName]));
    const standings = await this.standingsService.meet(actor, meetId, null);
    const coaches = await this.read.coachAddresses([...clubs.keys()]);
    const link = this.mail.link(`/results/meets/${meetId}`);
    let sent = 0;
    for (const coach of coaches) {
      const message = placingsMail(
        { to: coach.email, coachName: coach.displayName, clubId: coach.clubId, clubName: clubs.get(coach.clubId) ?? '' },
        { name: page.meetName, startsOn: page.startsOn, link },
        results,
        standings,
      );
      try {
        await this.mail.send(message);
        sent += 1;
      } catch (error) {
        this.logger.warn(`could not mail ${coach.email}: ${error instanceof Error ? error.message : String(error)}`);
      }
    }
    return sent;
  }
}
