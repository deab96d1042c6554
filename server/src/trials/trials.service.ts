import { Inject, Injectable } from '@nestjs/common';
import { canManageClub, canReachClub } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import type { AxeTrialModel } from './models/axe-trial.model.js';
import type { TrialListModel, TrialModel } from './models/trial.model.js';
import type { TrialSetupModel } from './models/trial-setup.model.js';
import { AxeStatusEnum, GrindEnum } from '../rack/models/rack.enums.js';
import { isUsable } from './trial-axe-use.js';
import { computeTrial } from './trial-mapping.js';
import { toAxeTrial, toListItem, toTrialModel } from './trials.mappers.js';
import { TrialsRepository } from './trials.repository.js';
import type { TrialEntity } from './entities/trial.entity.js';

/** Reading trials: the club's members see them, its coaches (and admins) record and edit them. */
@Injectable()
export class TrialsService {
  constructor(@Inject(TrialsRepository) private readonly repo: TrialsRepository) {}

  async list(actor: AuthUser, clubId: string): Promise<TrialListModel> {
    const club = await this.repo.findClub(clubId);
    if (!club) throw DomainError.notFound('That club');
    if (!canReachClub(actor, clubId)) throw DomainError.forbidden("Trials are for the club's own members.");
    const trials = await this.repo.clubTrials(clubId);
    const published = await this.repo.publishedTrialIds(trials.map((t) => t.id));
    return {
      clubId,
      clubName: club.name,
      canRecord: canManageClub(actor, clubId),
      trials: trials.map((t) => toListItem(t, computeTrial(t), published.has(t.id))),
    };
  }

  async detail(actor: AuthUser, id: string): Promise<TrialModel> {
    const trial = await this.readable(actor, id);
    return toTrialModel(trial, { canEdit: canManageClub(actor, trial.clubId), summary: await this.repo.summaryOf(id) });
  }

  /** A trial the caller may read; to anyone else it does not exist, so its existence does not leak. */
  async readable(actor: AuthUser, id: string): Promise<TrialEntity> {
    const trial = await this.repo.findTrial(id);
    if (!trial || !canReachClub(actor, trial.clubId)) throw DomainError.notFound('That trial');
    return trial;
  }

  /** A trial the caller may change: readable, and the caller coaches its club. */
  async editable(actor: AuthUser, id: string): Promise<TrialEntity> {
    const trial = await this.readable(actor, id);
    if (!canManageClub(actor, trial.clubId)) throw DomainError.forbidden("Only this club's coaches record and edit its trials.");
    return trial;
  }

  async setup(actor: AuthUser, clubId: string): Promise<TrialSetupModel> {
    const club = await this.repo.findClub(clubId);
    if (!club) throw DomainError.notFound('That club');
    if (!canManageClub(actor, clubId)) throw DomainError.forbidden("Only this club's coaches record its trials.");
    const [axes, athletes] = await Promise.all([this.repo.clubAxes(clubId), this.repo.clubAthletes(clubId)]);
    return {
      clubId,
      clubName: club.name,
      axes: axes.map((a) => ({
        id: a.id,
        label: a.label,
        grind: GrindEnum[a.grind],
        bevelIncludedDeg: a.bevelIncludedDeg,
        chiselWidthMm: a.chiselWidthMm,
        status: AxeStatusEnum[a.status],
        usable: isUsable(a.status),
      })),
      athletes: athletes.map((a) => ({ id: a.id, name: `${a.firstName} ${a.lastName}` })),
    };
  }

  async remove(actor: AuthUser, id: string): Promise<boolean> {
    await this.editable(actor, id);
    await this.repo.trials().delete({ id });
    return true;
  }

  /** The trials an axe took part in; club-only like every trial. */
  async axeTrials(actor: AuthUser, axeId: string): Promise<AxeTrialModel[]> {
    const axe = await this.repo.findAxe(axeId);
    if (!axe || !(axe.isPublic || canReachClub(actor, axe.clubId))) throw DomainError.notFound('That axe');
    if (!canReachClub(actor, axe.clubId)) throw DomainError.forbidden("An axe's trials are for its club's own members.");
    return (await this.repo.trialsOfAxe(axeId)).map((t) => toAxeTrial(t, axeId));
  }
}
