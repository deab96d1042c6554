import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { canManageClub, canReachClub } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { SearchIndexer } from '../search/search-indexer.service.js';
import { SearchOutboxRepository } from '../search/search-outbox.repository.js';
import { AXE_SEARCH_TYPE } from './axe-search-source.js';
import { axeValues, setupChanges, type AxeSetup } from './axe-values.js';
import type { AxeInput, RackFilter } from './dto/axe.input.js';
import { AxeServiceEntity } from './entities/axe-service.entity.js';
import { AxeEntity } from './entities/axe.entity.js';
import type { AxeDetailModel, RackModel } from './models/axe.model.js';
import { PhotoUrlSigner } from './photos/photo-url-signer.js';
import { assertCanEditAxe, canSeeAxe } from './rack-access.js';
import { toAxeModel, toPhotoModel, toServiceModel } from './rack.mappers.js';
import { RackRepository } from './rack.repository.js';
import { PhotosService } from './photos/photos.service.js';

@Injectable()
export class AxesService {
  constructor(
    @Inject(RackRepository) private readonly repo: RackRepository,
    @Inject(PhotoUrlSigner) private readonly signer: PhotoUrlSigner,
    @Inject(SearchOutboxRepository) private readonly outbox: SearchOutboxRepository,
    @Inject(SearchIndexer) private readonly indexer: SearchIndexer,
    @Inject(PhotosService) private readonly photos: PhotosService,
  ) {}

  /** Queues the axe for the search index (added, removed or changed when it is public or goes private). */
  async reindex(id: string): Promise<void> {
    await this.outbox.enqueue(null, AXE_SEARCH_TYPE, [id]);
    this.indexer.kick();
  }

  async rack(actor: AuthUser | null, clubId: string, filter: RackFilter = {}): Promise<RackModel> {
    const club = await this.repo.findClub(clubId);
    if (!club) throw DomainError.notFound('That club');
    const isMember = canReachClub(actor, clubId);
    const axes = await this.repo.rack({
      clubId,
      publicOnly: !isMember,
      grinds: filter.grinds ?? undefined,
      statuses: filter.statuses ?? undefined,
      allowedFor: filter.allowedFor ?? undefined,
    });
    const stats = await this.repo.stats(axes.map((a) => a.id));
    return { clubId, clubName: club.name, canManage: canManageClub(actor, clubId), isMember, axes: axes.map((a) => toAxeModel(a, stats.get(a.id))) };
  }

  async detail(actor: AuthUser | null, id: string, now = new Date()): Promise<AxeDetailModel> {
    const axe = await this.visibleAxe(actor, id);
    const [services, photos, stats] = await Promise.all([this.repo.servicesOf(id), this.repo.photosOf(id), this.repo.stats([id])]);
    return {
      ...toAxeModel(axe, stats.get(id)),
      services: services.map(toServiceModel),
      photos: photos.map((p) => toPhotoModel(p, this.signer.url(p.id, { signed: !axe.isPublic, now }))),
      canManage: canManageClub(actor, axe.clubId),
    };
  }

  async add(actor: AuthUser, clubId: string, input: AxeInput): Promise<AxeDetailModel> {
    if (!canManageClub(actor, clubId)) throw DomainError.forbidden("Only this club's coaches can change its rack.");
    if (!(await this.repo.findClub(clubId))) throw DomainError.notFound('That club');
    const values = axeValues(input);
    await this.assertLabelFree(clubId, values.label);
    const id = randomUUID();
    await this.repo.axes().insert({ id, clubId, ...values, createdBy: actor.id });
    await this.reindex(id);
    return this.detail(actor, id);
  }

  /** Edits the record; setup fields that change are logged as a correction, so history stays whole. */
  async update(actor: AuthUser, id: string, input: AxeInput, now = new Date()): Promise<AxeDetailModel> {
    const axe = await this.mustFind(id);
    assertCanEditAxe(actor, axe);
    const values = axeValues(input);
    if (values.label !== axe.label) await this.assertLabelFree(axe.clubId, values.label);
    const changes = setupChanges(axe as AxeSetup, values);
    const doneBy = await this.repo.displayName(actor.id);
    await this.repo.db.transaction(async (m) => {
      await this.repo.axes(m).update({ id }, values);
      if (changes.length === 0) return;
      await this.repo.services(m).insert({
        id: randomUUID(),
        axeId: id,
        kind: 'SETUP_CORRECTED',
        doneOn: now.toISOString().slice(0, 10),
        doneBy,
        loggedBy: actor.id,
        notes: '',
        changes,
      } satisfies Partial<AxeServiceEntity>);
    });
    await this.reindex(id);
    return this.detail(actor, id, now);
  }

  /**
   * Deletes an axe added by mistake, with its service log and photos. An axe with results,
   * trials or lineup places on record is retired instead, so that history keeps its axe.
   */
  async remove(actor: AuthUser, id: string): Promise<boolean> {
    const axe = await this.mustFind(id);
    assertCanEditAxe(actor, axe);
    const used = await this.repo.axeUsage(id);
    const uses = [
      used.results ? `${used.results} ${used.results === 1 ? 'result' : 'results'}` : null,
      used.trials ? `${used.trials} ${used.trials === 1 ? 'trial' : 'trials'}` : null,
      used.lineups ? `${used.lineups} lineup ${used.lineups === 1 ? 'place' : 'places'}` : null,
    ].filter(Boolean);
    if (uses.length > 0) {
      throw DomainError.badInput('id', `${axe.label} is on record in ${uses.join(', ')}. Set its status to retired instead, so that history keeps its axe.`);
    }
    const photos = await this.repo.photos().find({ where: { axeId: id }, select: { id: true, fileName: true } });
    await this.repo.axes().delete({ id });
    await this.photos.removeFiles(photos.map((p) => p.fileName));
    await this.reindex(id);
    return true;
  }

  async mustFind(id: string): Promise<AxeEntity> {
    const axe = await this.repo.findAxe(id);
    if (!axe) throw DomainError.notFound('That axe');
    return axe;
  }

  async visibleAxe(actor: AuthUser | null, id: string): Promise<AxeEntity> {
    const axe = await this.repo.findAxe(id);
    if (!axe || !canSeeAxe(actor, axe)) throw DomainError.notFound('That axe');
    return axe;
  }

  private async assertLabelFree(clubId: string, label: string): Promise<void> {
    if (await this.repo.axes().findOneBy({ clubId, label })) {
      throw DomainError.badInput('label', `The rack already has an axe labelled "${label}".`);
    }
  }
}
